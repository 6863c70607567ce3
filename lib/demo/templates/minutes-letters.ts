// Corporate minutes and correspondence. A cover letter enclosing an invoice, and minutes that
// approve a lease, are the look-alikes: they are what a real office finds hardest to file.
import { OFFICE, STREETS, pickPerson } from "../people";
import { TOPICS } from "./topics";
import { formatMoney } from "../random";
import { addressee, dated, identifiers, officeLetterhead, pickSome, salutation, signOff, type Template } from "./parts";

const RESOLUTIONS = ["to approve the financial statements for the last fiscal year", "to declare a dividend per share to shareholders of record", "to renew the lease of the premises on the terms presented", "to appoint the accountants for the coming year", "to open an operating account with the bank", "to approve the annual budget", "to authorise the president to sign the supply agreement"];

const minutes: Template = (ctx) => {
  const { rng } = ctx;
  const directors = [0, 1, 2, 3].map(() => pickPerson(rng));
  const kind = rng.pick(["board of directors", "shareholders", "members"]);
  return {
    fileStem: rng.pick([`minutes ${kind}`, "board minutes", `minutes ${dated(ctx)}`]),
    blocks: [
      { kind: "heading", text: `Minutes of the ${rng.pick(["Regular", "Annual", "Special"])} Meeting of the ${kind.replace(/\b\w/g, (c) => c.toUpperCase())}` },
      { kind: "lines", lines: [ctx.client, `Held on ${dated(ctx)} at ${rng.int(8, 17)}:00 at ${rng.int(2, 300)} ${rng.pick(STREETS)}`, ...identifiers(ctx).flatMap((b) => (b.kind === "lines" ? b.lines : []))] },
      { kind: "paragraph", text: `Present: ${directors.join(", ")}. ${directors[0]} chaired the meeting and ${directors[1]} acted as secretary. A quorum being present, the meeting was called to order.` },
      ...pickSome(ctx, RESOLUTIONS, rng.int(2, 4)).flatMap((r, i) => [
        { kind: "subheading" as const, text: `Resolution ${i + 1}` },
        { kind: "paragraph" as const, text: `RESOLVED, ${r}. Moved by ${rng.pick(directors)}, seconded by ${rng.pick(directors)}; carried ${rng.pick(["unanimously", "by a majority of votes"])}.` },
      ]),
      ...(rng.chance(0.3) ? [{ kind: "pageBreak" as const }] : []),
      { kind: "paragraph", text: "There being no further business, the meeting was adjourned." },
      { kind: "lines", lines: ["Secretary", directors[1]] },
    ],
  };
};

const writtenConsent: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["written consent", "unanimous consent of directors"]),
    blocks: [
      { kind: "heading", text: "Unanimous Written Consent of the Board of Directors" },
      { kind: "paragraph", text: `The undersigned, being all the directors of ${ctx.client}, adopt the following resolution without a meeting, effective ${dated(ctx)}:` },
      { kind: "paragraph", text: `RESOLVED, ${rng.pick(RESOLUTIONS)}, and the officers are authorised to take all steps needed to carry out this resolution.` },
      ...identifiers(ctx),
      { kind: "lines", lines: ["Directors:", pickPerson(rng), pickPerson(rng), pickPerson(rng)] },
    ],
  };
};


const letter: Template = (ctx) => {
  const { rng } = ctx;
  const fromOffice = rng.chance(0.6);
  return {
    fileStem: rng.pick(["letter", `letter to ${ctx.client}`, "correspondence", `re ${ctx.matter.title}`]),
    blocks: [
      fromOffice ? officeLetterhead(ctx) : { kind: "lines", lines: [ctx.client, `${ctx.contact}`] },
      addressee(ctx),
      ...identifiers(ctx),
      salutation(ctx),
      ...pickSome(ctx, TOPICS, rng.int(1, 3)).map((text) => ({ kind: "paragraph" as const, text })),
      signOff(ctx, fromOffice ? OFFICE.name : ctx.client),
    ],
  };
};

const emailPrintout: Template = (ctx) => {
  const { rng } = ctx;
  const sender = pickPerson(rng);
  return {
    fileStem: rng.pick(["email printout", `email ${dated(ctx)}`, "fw message"]),
    blocks: [
      { kind: "lines", lines: [`From: ${sender} <${sender.toLowerCase().replace(/[^a-z]+/g, ".")}@${OFFICE.domain}>`, `To: ${ctx.contact}`, `Date: ${dated(ctx)}`, `Subject: ${rng.pick(["Following up", "Documents received", "Next steps", "Quick question"])} - ${ctx.client}`] },
      addressee(ctx),
      { kind: "paragraph", text: `Hi ${ctx.contact.split(" ")[0]},` },
      ...pickSome(ctx, TOPICS, rng.int(1, 2)).map((text) => ({ kind: "paragraph" as const, text })),
      ...identifiers(ctx),
      { kind: "lines", lines: ["Best regards,", sender] },
    ],
  };
};

/** A look-alike: a cover letter enclosing an invoice, with the invoice figures in it. */
const coverLetterWithInvoice: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["cover letter", "letter enclosing invoice"]),
    blocks: [
      officeLetterhead(ctx),
      addressee(ctx),
      salutation(ctx),
      { kind: "paragraph", text: `Please find enclosed our invoice ${rng.int(2000, 9999)} for work in ${ctx.matter.title.toLowerCase()}. The amount due is ${formatMoney(rng.money(300, 9000))}.` },
      { kind: "paragraph", text: rng.pick(TOPICS) },
      ...identifiers(ctx),
      signOff(ctx, OFFICE.name),
    ],
  };
};

export const MINUTES_LETTER_TEMPLATES: Record<string, Template[]> = {
  "Corporate minutes": [minutes, minutes, writtenConsent],
  Correspondence: [letter, letter, emailPrintout, coverLetterWithInvoice],
};
