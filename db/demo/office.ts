// The invented demo office: Alder Quay Partners, a small law and accounting practice.
// Every name here is made up; e-mail addresses use example.com (reserved by RFC 2606).
export const DEMO_OFFICE = "Alder Quay Partners";

export type Role = "clerk" | "partner" | "admin" | "auditor";

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "clerk@example.com", name: "Tamsin Reyes", role: "clerk" },
  { email: "partner@example.com", name: "Oluwaseun Hartley", role: "partner" },
  { email: "admin@example.com", name: "Greta Lindqvist", role: "admin" },
  { email: "auditor@example.com", name: "Marcus Ebner", role: "auditor" },
];

export const DEMO_CLIENTS = [
  { name: "Marlowe Street Bakery LLC", aliases: ["Marlowe Bakery"], emailDomains: ["marlowebakery.example"], taxIdLast4: "4417" },
  { name: "Ostrander Family Trust", aliases: ["Ostrander Trust"], emailDomains: ["ostrander.example"], taxIdLast4: "9031" },
  { name: "Pellucid Dental Group PC", aliases: ["Pellucid Dental"], emailDomains: ["pelluciddental.example"], taxIdLast4: "2268" },
  { name: "Ravelston Freight Co.", aliases: ["Ravelston Freight", "RFC Logistics"], emailDomains: ["ravelston.example"], taxIdLast4: "7750" },
];

/** One matter is restricted (an ethical wall): only the partner and admin are on its team. */
export const DEMO_MATTERS = [
  { number: "AQ-2026-0101", client: "Marlowe Street Bakery LLC", title: "2025 bookkeeping and tax return", restricted: false, team: ["clerk@example.com", "partner@example.com"] },
  { number: "AQ-2026-0102", client: "Marlowe Street Bakery LLC", title: "Shop lease renewal", restricted: false, team: ["clerk@example.com", "partner@example.com"] },
  { number: "AQ-2026-0117", client: "Ostrander Family Trust", title: "Trust administration", restricted: false, team: ["clerk@example.com", "partner@example.com"] },
  { number: "AQ-2026-0123", client: "Pellucid Dental Group PC", title: "Payroll and employment matters", restricted: false, team: ["clerk@example.com"] },
  { number: "AQ-2026-0131", client: "Ravelston Freight Co.", title: "Dispute with former carrier (restricted)", restricted: true, team: ["partner@example.com"] },
];
