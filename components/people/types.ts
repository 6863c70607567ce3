// The shapes the People screens receive from the server (lib/data/people.ts, lib/data/senders.ts).
import type { Person } from "@/lib/data/people";
import type { Role } from "@/lib/auth/permissions";
export type { Role };
export type { PersonState } from "@/lib/data/people";
export type PersonView = Person;

export const ROLE_WORDS: Record<Role, string> = { clerk: "Clerk", partner: "Partner", admin: "Admin", auditor: "Auditor" };

export function formatWhen(iso: string | null): string {
  return iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : "–";
}
