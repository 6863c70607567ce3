// The shapes the People screens receive from the server (lib/data/people.ts, lib/data/senders.ts).
export type Role = "clerk" | "partner" | "admin" | "auditor";
export type PersonState = "invited" | "active" | "deactivated";

export interface PersonView {
  id: number;
  email: string;
  name: string;
  role: Role;
  state: PersonState;
  lastSignInAt: string | null;
  invitedAt: string | null;
  invitationExpiresAt: string | null;
}

export const ROLE_WORDS: Record<Role, string> = { clerk: "Clerk", partner: "Partner", admin: "Admin", auditor: "Auditor" };

export function formatWhen(iso: string | null): string {
  return iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : "–";
}
