// Who may do what (DESIGN §2). Pure data, shared by the server checks and the navigation.
// The server is the authority: hiding a link is a convenience, never the check.
export const ROLES = ["clerk", "partner", "admin", "auditor"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = {
  "documents.read": ["clerk", "partner", "admin", "auditor"],
  "documents.upload": ["clerk", "admin"],
  "filing.decide": ["clerk", "partner", "admin"],
  // Everyone who reads documents sees which are held (a hold must be seen to be kept);
  // partners on the matter and admins place and lift them (the matter check is in lib/data/holds.ts).
  "holds.read": ["clerk", "partner", "admin", "auditor"],
  "holds.place": ["partner", "admin"],
  // Disposal: admins propose; a partner on every matter involved, or another admin, approves
  // (checked per batch in lib/data/disposal-decide.ts); auditors read batches and certificates.
  "disposal.read": ["partner", "admin", "auditor"],
  "disposal.propose": ["admin"],
  "disposal.approve": ["partner", "admin"],
  "history.read": ["admin", "auditor"],
  "models.read": ["admin", "auditor"],
  "models.manage": ["admin"],
  "setup.manage": ["admin"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export interface Area {
  href: string;
  label: string;
  permission: Permission;
  blurb: string;
}

/** The areas of the signed-in app, in rail order (DESIGN §3). */
export const AREAS: Area[] = [
  { href: "/intake", label: "Intake", permission: "documents.upload", blurb: "Drop files to be read and filed." },
  { href: "/review", label: "To review", permission: "filing.decide", blurb: "Accept or refile the suggestions." },
  { href: "/cabinets", label: "Cabinets", permission: "documents.read", blurb: "Browse and search what is filed." },
  { href: "/holds", label: "Holds", permission: "holds.read", blurb: "Legal holds on matters and documents." },
  { href: "/disposal", label: "Disposal", permission: "disposal.read", blurb: "Past-due records, destroyed only with a second person's approval." },
  { href: "/history", label: "History", permission: "history.read", blurb: "Every filing and refile, on the record." },
  { href: "/models", label: "Models", permission: "models.read", blurb: "Model versions, metrics and retraining." },
  { href: "/setup", label: "Setup", permission: "setup.manage", blurb: "Cabinet types, clients & matters, people." },
];

export function areasFor(role: Role): Area[] {
  return AREAS.filter((a) => can(role, a.permission));
}
