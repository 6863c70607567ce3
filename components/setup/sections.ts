// The sections of Setup, in the order the index shows them. A new Setup page is one line here
// (People, Outbox, Allowed senders and Import join as they are built).
import type { Permission } from "@/lib/auth/permissions";

export interface SetupSection {
  href: string;
  label: string;
  blurb: string;
  permission: Permission;
}

export const SETUP_SECTIONS: SetupSection[] = [
  { href: "/setup/cabinet-types", label: "Cabinet types", blurb: "What the model files into: names, descriptions, keywords and retention. Retire, restore, merge.", permission: "setup.manage" },
  { href: "/setup/matters", label: "Clients & matters", blurb: "Clients with their aliases and e-mail domains; matters with their dates, status, restriction and team.", permission: "setup.manage" },
];
