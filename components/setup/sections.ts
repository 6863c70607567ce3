// The sections of Setup, in the order the index shows them. A new Setup page is one line here

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
  { href: "/setup/people", label: "People", blurb: "Who works here and in which role: invite, change a role, deactivate, send a new invitation.", permission: "setup.manage" },
  { href: "/setup/senders", label: "Allowed senders", blurb: "Addresses and domains whose e-mailed scans Foldwright files from the intake address.", permission: "setup.manage" },
  { href: "/setup/import", label: "Import an archive", blurb: "Bring in the office's existing filed folders (a zip or a folder): proposed, confirmed, then stored, read and filed as imported.", permission: "setup.manage" },
  { href: "/setup/outbox", label: "Outbox", blurb: "Every message Foldwright sent or is about to send, with its state.", permission: "setup.manage" },
];
