"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/models/request";

/** Ask for a reset link; the answer is the same whether or not the address has an account. */
export function ForgotForm() {
  const [answer, setAnswer] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(form: HTMLFormElement) {
    setPending(true);
    setError(null);
    try {
      const { message } = await requestJson<{ message: string }>("/api/auth/forgot-password", { method: "POST", body: JSON.stringify({ email: new FormData(form).get("email") }) });
      setAnswer(message);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setPending(false);
    }
  }

  if (answer) return <Notice title="Check your e-mail">{answer}</Notice>;
  return (
    <form
      className="space-y-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void submit(e.currentTarget);
      }}
    >
      {error && <Notice tone="error" title="Not sent">{error}</Notice>}
      <label className="block text-sm">
        <span className="mb-1 block font-medium">E-mail</span>
        <input name="email" type="email" autoComplete="username" required autoFocus className="w-full rounded border border-paper-edge bg-white px-3 py-2" />
      </label>
      <Button type="submit" disabled={pending} className="w-full py-2">{pending ? "Sending…" : "Send me a link"}</Button>
    </form>
  );
}
