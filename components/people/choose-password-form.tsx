"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/models/request";

interface Props {
  endpoint: "/api/auth/accept-invitation" | "/api/auth/reset-password";
  token: string;
  email: string;
  rules: string;
}

/** Choose a password through a one-time link; the server checks the rules and answers with a sentence. */
export function ChoosePasswordForm({ endpoint, token, email, rules }: Props) {
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(form: HTMLFormElement) {
    const data = new FormData(form);
    if (data.get("password") !== data.get("again")) {
      setError("The two passwords differ. Type the same password twice.");
      return;
    }
    setPending(true);
    setError(null);
    try {
      const { message } = await requestJson<{ message: string }>(endpoint, { method: "POST", body: JSON.stringify({ token, password: data.get("password") }) });
      setDone(message);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setPending(false);
    }
  }

  if (done) {
    return (
      <div className="space-y-3">
        <Notice title="Password set">{done}</Notice>
        <Link href="/sign-in" className="inline-block text-verdigris underline-offset-2 hover:underline" data-testid="go-sign-in">Go to sign-in</Link>
      </div>
    );
  }
  return (
    <form
      className="space-y-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void submit(e.currentTarget);
      }}
    >
      {error && <Notice tone="error" title="Password not set">{error}</Notice>}
      <input type="hidden" name="username" autoComplete="username" value={email} readOnly />
      <p className="text-sm">For <span className="font-mono">{email}</span></p>
      <label className="block text-sm">
        <span className="mb-1 block font-medium">New password</span>
        <input name="password" type="password" autoComplete="new-password" required autoFocus className="w-full rounded border border-paper-edge bg-white px-3 py-2" data-testid="new-password" />
        <span className="mt-1 block text-xs text-ink-soft">{rules}</span>
      </label>
      <label className="block text-sm">
        <span className="mb-1 block font-medium">The same again</span>
        <input name="again" type="password" autoComplete="new-password" required className="w-full rounded border border-paper-edge bg-white px-3 py-2" data-testid="new-password-again" />
      </label>
      <Button type="submit" disabled={pending} className="w-full py-2" data-testid="set-password">{pending ? "Saving…" : "Set password"}</Button>
    </form>
  );
}
