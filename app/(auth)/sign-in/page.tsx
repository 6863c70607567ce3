import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/data/current-user";
import { env } from "@/lib/env";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  if (await getCurrentUser()) redirect("/");
  const { next } = await searchParams;
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm">
        <h1 className="mb-1 font-serif text-3xl">Foldwright</h1>
        <p className="mb-6 text-sm text-ink-soft">Sign in to file and find your office&apos;s documents.</p>
        <div className="rounded-md border border-paper-edge bg-white/70 p-6 shadow-sm">
          <SignInForm next={next} />
          <p className="mt-4 text-sm">
            <Link href="/forgot-password" className="text-verdigris underline-offset-2 hover:underline">Forgot your password?</Link>
          </p>
        </div>
        <p className="mt-4 text-xs text-ink-faint">
          After {env.signIn.maxFailures} wrong passwords an account is locked for {env.signIn.lockMinutes} minutes. Sessions end after a period without activity.
        </p>
      </div>
    </main>
  );
}
