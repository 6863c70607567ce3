"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { RateLimited } from "@/lib/errors";
import { clientAddressOf } from "@/lib/net/client-address";
import { signIn, signOut } from "@/lib/auth/sign-in";
import { signInSchema } from "@/lib/validations/auth";

export interface SignInState {
  message?: string;
  locked?: boolean;
  fieldErrors?: { email?: string; password?: string };
  email?: string;
}

function safeNext(value: FormDataEntryValue | null): string {
  const next = typeof value === "string" ? value : "";
  return next.startsWith("/") && !next.startsWith("//") ? next : "/";
}

export async function signInAction(_prev: SignInState, form: FormData): Promise<SignInState> {
  const parsed = signInSchema.safeParse({ email: form.get("email"), password: form.get("password") });
  const email = String(form.get("email") ?? "");
  if (!parsed.success) {
    const errors = parsed.error.flatten().fieldErrors;
    return { email, fieldErrors: { email: errors.email?.[0], password: errors.password?.[0] } };
  }
  let result;
  try {
    result = await signIn(parsed.data.email, parsed.data.password, clientAddressOf(await headers()));
  } catch (e) {
    if (e instanceof RateLimited) return { email, message: e.message, locked: true };
    throw e;
  }
  if (!result.ok) return { email, message: result.message, locked: result.code === "account_locked" };
  redirect(safeNext(form.get("next")));
}

export async function signOutAction(): Promise<void> {
  await signOut();
  redirect("/sign-in");
}
