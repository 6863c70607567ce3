"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { signInAction, type SignInState } from "./actions";

export function SignInForm({ next }: { next?: string }) {
  const [state, action, pending] = useActionState<SignInState, FormData>(signInAction, {});
  return (
    <form action={action} className="space-y-4" noValidate>
      {state.message && (
        <Notice tone={state.locked ? "warning" : "error"} title={state.locked ? "Account locked" : "Not signed in"}>
          {state.message}
        </Notice>
      )}
      <input type="hidden" name="next" value={next ?? "/"} />
      <label className="block text-sm">
        <span className="mb-1 block font-medium">E-mail</span>
        <input
          name="email"
          type="email"
          autoComplete="username"
          defaultValue={state.email}
          required
          autoFocus
          className="w-full rounded border border-paper-edge bg-white px-3 py-2"
        />
        {state.fieldErrors?.email && <span className="mt-1 block text-brick">{state.fieldErrors.email}</span>}
      </label>
      <label className="block text-sm">
        <span className="mb-1 block font-medium">Password</span>
        <input
          name="password"
          type="password"
          autoComplete="current-password"
          required
          className="w-full rounded border border-paper-edge bg-white px-3 py-2"
        />
        {state.fieldErrors?.password && <span className="mt-1 block text-brick">{state.fieldErrors.password}</span>}
      </label>
      <Button type="submit" disabled={pending} className="w-full py-2">
        {pending ? "Checking…" : "Sign in"}
      </Button>
    </form>
  );
}
