// Pieces every template uses: letterheads, the addressee, identifier lines and sign-offs, each
// with a few interchangeable wordings so no two documents of a type read alike.
import type { Block } from "../doc-model";
import { clientEmail, matterRef, taxIdLine, type DocContext } from "../context";
import { OFFICE, pickAddress, pickPerson } from "../people";
import { formatDate } from "../random";

export type Template = (ctx: DocContext) => { fileStem: string; blocks: Block[] };

export function letterhead(ctx: DocContext, name: string, extra: string[] = []): Block {
  return { kind: "lines", lines: [name.toUpperCase(), ...pickAddress(ctx.rng), ...extra], align: ctx.rng.pick(["left", "right", "center"] as const) };
}

export function officeLetterhead(ctx: DocContext): Block {
  return { kind: "lines", lines: [OFFICE.name, `${OFFICE.street}, ${OFFICE.town}`, `office@${OFFICE.domain}`], align: ctx.rng.pick(["left", "right", "center"] as const) };
}

export function dated(ctx: DocContext): string {
  return formatDate(ctx.date, ctx.rng.int(0, 2));
}

/** The addressee block with whichever identifiers this document shows. */
export function addressee(ctx: DocContext): Block {
  return { kind: "lines", lines: [dated(ctx), "", ctx.contact, ctx.client, ...pickAddress(ctx.rng), ...clientEmail(ctx)] };
}

/** Identifier lines (matter number, tax ID) as their own block, or nothing. */
export function identifiers(ctx: DocContext): Block[] {
  const lines = [...matterRef(ctx), ...taxIdLine(ctx)];
  return lines.length > 0 ? [{ kind: "lines", lines }] : [];
}

export function salutation(ctx: DocContext): Block {
  const family = ctx.contact.split(" ").slice(-1)[0];
  return { kind: "paragraph", text: ctx.rng.pick([`Dear ${ctx.contact},`, `Dear Ms. ${family},`, `Dear Mr. ${family},`, `Dear ${ctx.contact.split(" ")[0]},`]) };
}

export function signOff(ctx: DocContext, role: string, person = pickPerson(ctx.rng)): Block {
  return { kind: "lines", lines: [ctx.rng.pick(["Sincerely,", "Kind regards,", "Yours faithfully,", "With best regards,", "Regards,"]), "", person, role] };
}

/** Picks n different items. */
export function pickSome<T>(ctx: DocContext, items: readonly T[], n: number): T[] {
  return ctx.rng.shuffle(items).slice(0, n);
}
