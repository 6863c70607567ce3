"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { requestJson } from "@/components/models/request";
import { formatWhen, ROLE_WORDS, type PersonView, type Role } from "./types";

const TD = "px-2 py-1.5 align-top";
const STATE_WORDS = { invited: "Invited", active: "Active", deactivated: "Deactivated" } as const;

interface Props {
  person: PersonView;
  isMe: boolean;
  onChanged: (p: PersonView) => void;
  onError: (message: string) => void;
}

/** One person: role, state, last sign-in, and the acts on them (deactivation asks first). */
export function PersonRow({ person, isMe, onChanged, onError }: Props) {
  const [confirming, setConfirming] = useState(false);
  const [pending, setPending] = useState(false);

  async function send(url: string, init: RequestInit) {
    setPending(true);
    try {
      const { person: next } = await requestJson<{ person: PersonView }>(url, init);
      onChanged(next);
    } catch (e) {
      onError(e instanceof Error ? e.message : String(e));
    } finally {
      setPending(false);
      setConfirming(false);
    }
  }
  const patch = (body: object) => send(`/api/users/${person.id}`, { method: "PATCH", body: JSON.stringify(body) });

  return (
    <tr className="border-t border-paper-edge/70" data-testid="person-row" data-email={person.email}>
      <td className={TD}>
        <span className="font-medium">{person.name}</span>
        {isMe && <span className="ml-1 text-xs text-ink-faint">(you)</span>}
        <span className="block font-mono text-xs text-ink-soft">{person.email}</span>
      </td>
      <td className={TD}>
        <select
          aria-label={`Role of ${person.name}`}
          value={person.role}
          disabled={pending || person.state === "deactivated"}
          onChange={(e) => void patch({ role: e.target.value as Role })}
          className="rounded border border-paper-edge bg-white px-1.5 py-1 text-sm"
        >
          {(Object.keys(ROLE_WORDS) as Role[]).map((r) => (
            <option key={r} value={r}>{ROLE_WORDS[r]}</option>
          ))}
        </select>
      </td>
      <td className={TD} data-testid="person-state">
        {STATE_WORDS[person.state]}
        {person.state === "invited" && person.invitationExpiresAt && (
          <span className="block text-xs text-ink-faint">link until {formatWhen(person.invitationExpiresAt)}</span>
        )}
        {person.state === "invited" && !person.invitationExpiresAt && <span className="block text-xs text-amber">link expired or used</span>}
      </td>
      <td className={`${TD} whitespace-nowrap font-mono text-xs`}>{formatWhen(person.lastSignInAt)}</td>
      <td className={`${TD} whitespace-nowrap text-right`}>
        {person.state === "invited" && (
          <Button variant="quiet" disabled={pending} onClick={() => void send(`/api/users/${person.id}/invitation`, { method: "POST" })}>
            Send invitation again
          </Button>
        )}
        {person.state !== "deactivated" && !confirming && (
          <Button variant="quiet" disabled={pending} className="ml-1" onClick={() => setConfirming(true)}>
            Deactivate
          </Button>
        )}
        {confirming && (
          <span className="ml-1 inline-flex items-center gap-1 text-sm" role="group" aria-label="Confirm deactivation">
            {isMe ? "Deactivate yourself? You will be signed out." : `Deactivate ${person.name}? Their sessions end now.`}
            <Button variant="danger" disabled={pending} onClick={() => void patch({ active: false })}>Deactivate</Button>
            <Button variant="quiet" onClick={() => setConfirming(false)} autoFocus>Keep</Button>
          </span>
        )}
        {person.state === "deactivated" && (
          <Button variant="quiet" disabled={pending} onClick={() => void patch({ active: true })}>Reactivate</Button>
        )}
      </td>
    </tr>
  );
}
