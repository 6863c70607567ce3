// What one generated document knows about its client and matter, and the small phrases that put
// identifiers into text: the client's name or an alias, sometimes the matter number, sometimes an
// e-mail on the client's domain, sometimes a tax ID ending, in the ways offices write them.
import { pickPerson, mailbox } from "./people";
import type { Random } from "./random";
import type { MatterRecord } from "@/lib/filing/match-matter";

/** A matter as the matter matcher reads it, less what generation does not need. */
export type DemoMatterInput = Omit<MatterRecord, "id" | "status">;

export interface DocContext {
  rng: Random;
  matter: DemoMatterInput;
  /** The client as this document names it: its full name or one of its aliases. */
  client: string;
  date: Date;
  /** A person at the client, for salutations and e-mail addresses. */
  contact: string;
  showMatterNumber: boolean;
  showEmail: boolean;
  showTaxId: boolean;
}

const FIRST_DAY = Date.UTC(2025, 0, 6);
const DAYS = 480;

/** Draws one document's context; about half name the matter, a third show an e-mail or tax ID. */
export function createContext(rng: Random, matter: DemoMatterInput): DocContext {
  const names = [matter.clientName, ...matter.aliases];
  return {
    rng,
    matter,
    client: rng.chance(0.6) ? matter.clientName : rng.pick(names),
    date: new Date(FIRST_DAY + rng.int(0, DAYS) * 86_400_000),
    contact: pickPerson(rng),
    showMatterNumber: rng.chance(0.45),
    showEmail: matter.emailDomains.length > 0 && rng.chance(0.35),
    showTaxId: matter.taxIdLast4 !== null && rng.chance(0.3),
  };
}

/** "Our ref: AQ-2026-0101" in one of a few forms, or nothing. */
export function matterRef(ctx: DocContext): string[] {
  if (!ctx.showMatterNumber) return [];
  const n = ctx.matter.number;
  return [ctx.rng.pick([`Our ref: ${n}`, `Matter ${n}`, `Re: ${n} - ${ctx.matter.title}`, `File no. ${n}`, `Ref. ${n.toLowerCase()}`])];
}

/** The contact's e-mail on the client's domain, or nothing. */
export function clientEmail(ctx: DocContext): string[] {
  if (!ctx.showEmail) return [];
  return [`${ctx.rng.pick(["E-mail", "Email", "Contact"])}: ${mailbox(ctx.contact)}@${ctx.rng.pick(ctx.matter.emailDomains)}`];
}

/** A tax ID ending the way forms and letters mask it, or nothing. */
export function taxIdLine(ctx: DocContext): string[] {
  const last4 = ctx.matter.taxIdLast4;
  if (!ctx.showTaxId || last4 === null) return [];
  return [ctx.rng.pick([`EIN xx-xxx${last4}`, `Taxpayer ID ending ${last4}`, `EIN ...${last4}`, `TIN: XX-XXX${last4}`, `Employer identification number ending in ${last4}`])];
}
