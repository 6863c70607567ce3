"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/models/request";
import { ROLE_WORDS, type PersonView, type Role } from "./types";

const FIELD = "rounded border border-paper-edge bg-white px-2 py-1.5 text-sm";

/** Invite a person: they get an e-mail with a one-time link (72 hours) to choose their password. */
export function InviteForm({ onInvited }: { onInvited: (p: PersonView) => void }) {
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function submit(form: HTMLFormElement) {
    const data = new FormData(form);
    setPending(true);
    setError(null);
    setDone(null);
    try {
      const { person } = await requestJson<{ person: PersonView }>("/api/users", {
        method: "POST",
        body: JSON.stringify({ email: data.get("email"), name: data.get("name"), role: data.get("role") }),
      });
      onInvited(person);
      setDone(`Invitation sent to ${person.email}. The link works once, for 72 hours.`);
      form.reset();
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setPending(false);
    }
  }

  return (
    <form
      className="flex flex-wrap items-end gap-2 rounded border border-paper-edge bg-white/60 p-3"
      aria-label="Invite a person"
      onSubmit={(e) => {
        e.preventDefault();
        void submit(e.currentTarget);
      }}
    >
      <label className="min-w-0 max-w-full text-sm">
        <span className="mb-1 block font-medium">Name</span>
        <input name="name" required maxLength={120} className={`${FIELD} w-full sm:w-48`} data-testid="invite-name" />
      </label>
      <label className="min-w-0 max-w-full text-sm">
        <span className="mb-1 block font-medium">E-mail</span>
        <input name="email" type="email" required className={`${FIELD} w-full sm:w-64`} data-testid="invite-email" />
      </label>
      <label className="min-w-0 max-w-full text-sm">
        <span className="mb-1 block font-medium">Role</span>
        <select name="role" defaultValue="clerk" className={FIELD} data-testid="invite-role">
          {(Object.keys(ROLE_WORDS) as Role[]).map((r) => (
            <option key={r} value={r}>{ROLE_WORDS[r]}</option>
          ))}
        </select>
      </label>
      <Button type="submit" disabled={pending} data-testid="invite-submit">{pending ? "Sending…" : "Send invitation"}</Button>
      <div className="basis-full" aria-live="polite">
        {error && <Notice tone="error" title="Not invited">{error}</Notice>}
        {done && <Notice title="Invited">{done}</Notice>}
      </div>
    </form>
  );
}
