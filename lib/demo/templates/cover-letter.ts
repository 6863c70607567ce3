// The short covering letter that travels with almost every kind of paper. Offices file it with
// what it encloses, so each type has one, and only one sentence tells them apart: this is what
// keeps the demo classifier honest (about nine in ten right, not all).
import { OFFICE } from "../people";
import { addressee, identifiers, officeLetterhead, pickSome, salutation, signOff, type Template } from "./parts";
import { TOPICS } from "./topics";

/** One sentence per cabinet type naming what the letter encloses. */
export const ENCLOSURES: Record<string, string[]> = {
  "Engagement & fee letters": ["I enclose two copies of our engagement letter; please sign one and return it.", "Enclosed is our revised fee schedule for the coming year."],
  "Invoices & receipts": ["Please find enclosed our invoice for last month's work.", "I enclose the receipt for your payment, for your records."],
  "Bank & card statements": ["I enclose copies of the bank statements you asked for.", "Enclosed are the card statements for the last quarter."],
  "Tax-authority notices": ["I enclose the notice we received from the tax authority this week.", "Enclosed is a copy of the assessment notice; we will reply before the deadline."],
  "Payroll records": ["I enclose this month's payslips and the payroll summary.", "Enclosed are the wage statements for your employees."],
  "Contracts & leases": ["Please find enclosed the signed lease for your records.", "I enclose the final agreement, signed by both parties."],
  "Court filings": ["I enclose a copy of the motion filed with the court today.", "Enclosed is the court's order from last week's hearing."],
  "Wills & trust papers": ["I enclose the signed will and a copy for your files.", "Enclosed is the amended trust instrument."],
  "Corporate minutes": ["I enclose the minutes of the last board meeting for signature.", "Enclosed are the resolutions adopted by the directors."],
  Correspondence: ["I enclose a copy of my earlier letter.", "Thank you for your letter about the invoice, the lease and the notice; we will answer each point shortly."],
};

/** A covering letter of the given type: generic paragraphs around one enclosure sentence. */
export function makeCoverLetter(typeName: string): Template {
  return (ctx) => {
    const { rng } = ctx;
    const paragraphs = [rng.pick(ENCLOSURES[typeName] ?? ["I enclose the papers we discussed."]), ...pickSome(ctx, TOPICS, rng.int(1, 2))];
    return {
      fileStem: rng.pick(["letter", "cover letter", "scan"]),
      blocks: [officeLetterhead(ctx), addressee(ctx), ...identifiers(ctx), salutation(ctx), ...rng.shuffle(paragraphs).map((text) => ({ kind: "paragraph" as const, text })), signOff(ctx, OFFICE.name)],
    };
  };
}
