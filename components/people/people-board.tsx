"use client";
import { useState } from "react";
import { Notice } from "@/components/ui/notice";
import { InviteForm } from "./invite-form";
import { PersonRow } from "./person-row";
import type { PersonView } from "./types";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";

export function PeopleBoard({ initial, meId }: { initial: PersonView[]; meId: number }) {
  const [people, setPeople] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const replace = (p: PersonView) => {
    setError(null);
    setPeople((list) => (list.some((x) => x.id === p.id) ? list.map((x) => (x.id === p.id ? p : x)) : [p, ...list]));
  };
  return (
    <div className="space-y-4">
      <InviteForm onInvited={replace} />
      {error && <Notice tone="error" title="Not changed">{error}</Notice>}
      <div className="max-h-[65vh] overflow-auto rounded border border-paper-edge bg-white/70">
        <table className="w-full border-collapse text-sm" data-testid="people-table">
          <thead>
            <tr>
              <th scope="col" className={TH}>Person</th>
              <th scope="col" className={TH}>Role</th>
              <th scope="col" className={TH}>State</th>
              <th scope="col" className={TH}>Last sign-in</th>
              <th scope="col" className={`${TH} text-right`}>Acts</th>
            </tr>
          </thead>
          <tbody>
            {people.map((p) => (
              <PersonRow key={p.id} person={p} isMe={p.id === meId} onChanged={replace} onError={setError} />
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
