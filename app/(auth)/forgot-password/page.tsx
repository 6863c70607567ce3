import type { Metadata } from "next";
import Link from "next/link";
import { AuthCard } from "@/components/people/auth-card";
import { ForgotForm } from "@/components/people/forgot-form";

export const metadata: Metadata = { title: "Forgot your password?" };

// Public on purpose: anyone may ask; the answer never says whether an address has an account.
export default function ForgotPasswordPage() {
  return (
    <AuthCard title="Forgot your password?" lead="Enter your e-mail address and we will send a link to choose a new one.">
      <ForgotForm />
      <p className="mt-4 text-sm">
        <Link href="/sign-in" className="text-verdigris underline-offset-2 hover:underline">Back to sign-in</Link>
      </p>
    </AuthCard>
  );
}
