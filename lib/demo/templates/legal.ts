// Engagement & fee letters and contracts & leases. A services agreement with hourly rates sits
// between the two, and a fee-change letter reads much like ordinary correspondence.
import { COUNTERPARTIES, OFFICE, STREETS, TOWNS, pickPerson } from "../people";
import { formatMoney } from "../random";
import { addressee, dated, identifiers, officeLetterhead, salutation, signOff, type Template } from "./parts";

const SERVICES = ["preparation of your federal and state income tax returns", "monthly bookkeeping and bank reconciliations", "payroll processing and quarterly filings", "advice on the renewal of your commercial lease", "administration of the trust and annual accounts to beneficiaries", "representation in the dispute with your former carrier", "review of employment contracts and handbooks"];

const engagementLetter: Template = (ctx) => {
  const { rng } = ctx;
  const partner = pickPerson(rng);
  const rate = rng.int(14, 42) * 10;
  return {
    fileStem: rng.pick(["engagement letter", "terms of engagement", `engagement ${ctx.client}`]),
    blocks: [
      officeLetterhead(ctx),
      addressee(ctx),
      ...identifiers(ctx),
      { kind: "subheading", text: rng.pick(["Terms of engagement", "Engagement letter", "Letter of engagement and fee agreement"]) },
      salutation(ctx),
      { kind: "paragraph", text: `Thank you for choosing ${OFFICE.name}. This letter sets out the scope of services we will provide to ${ctx.client}, namely ${rng.pick(SERVICES)}, and the basis of our fees.` },
      { kind: "paragraph", text: rng.pick([`Our fees are charged at an hourly rate of ${formatMoney(rate)} for partners and ${formatMoney(rate * 0.6)} for staff, billed monthly.`, `We will charge a fixed fee of ${formatMoney(rng.int(12, 90) * 100)} for the engagement, payable in two instalments.`, `We ask for a retainer of ${formatMoney(rng.int(10, 50) * 100)}, held in our client trust account and applied to our final invoice.`]) },
      { kind: "paragraph", text: rng.pick(["Either of us may end the engagement by written notice. Work done up to that date will be billed at the rates above.", "Matters outside this scope of services will be agreed in writing before we begin them.", "Please sign and return a copy of this letter to confirm the terms of engagement."]) },
      signOff(ctx, "Partner", partner),
      { kind: "lines", lines: ["Agreed and accepted:", "", `for ${ctx.client}`, "Date: ______________"] },
    ],
  };
};

/** A look-alike: a short letter changing fees, in plain letter form. */
const feeChangeLetter: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["fee update", "letter - revised fees"]),
    blocks: [
      officeLetterhead(ctx),
      addressee(ctx),
      salutation(ctx),
      { kind: "paragraph", text: `From ${dated(ctx)} our hourly rate for your matter will change to ${formatMoney(rng.int(16, 45) * 10)}. The scope of our work for ${ctx.client} is unchanged.` },
      ...identifiers(ctx),
      signOff(ctx, "Partner"),
    ],
  };
};

const lease: Template = (ctx) => {
  const { rng } = ctx;
  const landlord = rng.pick(COUNTERPARTIES);
  const rent = rng.money(1200, 9800);
  const years = rng.int(2, 10);
  const premises = `${rng.int(2, 400)} ${rng.pick(STREETS)}, ${rng.pick(TOWNS)}`;
  return {
    fileStem: rng.pick(["lease", "commercial lease", `lease renewal ${rng.pick(STREETS)}`]),
    blocks: [
      { kind: "heading", text: rng.pick(["COMMERCIAL LEASE AGREEMENT", "Lease Renewal Agreement", "Retail Premises Lease"]) },
      { kind: "paragraph", text: `This lease is made on ${dated(ctx)} between ${landlord} (the "Landlord") and ${ctx.client} (the "Tenant"), together the parties.` },
      ...identifiers(ctx),
      { kind: "subheading", text: "1. Premises and term" },
      { kind: "paragraph", text: `The Landlord leases to the Tenant the premises at ${premises} for a term of ${years} years from the commencement date, with ${rng.pick(["one option", "two options"])} to renew.` },
      { kind: "subheading", text: "2. Rent" },
      { kind: "paragraph", text: `The Tenant shall pay rent of ${formatMoney(rent)} per month in advance, increased by ${rng.int(2, 4)}% on each anniversary, and a security deposit of ${formatMoney(rent * 2)}.` },
      ...(rng.chance(0.6) ? [{ kind: "pageBreak" as const }] : []),
      { kind: "subheading", text: "3. Termination" },
      { kind: "paragraph", text: "Either party may terminate this lease on a material breach not cured within thirty days of written notice. The Tenant shall return the premises in good repair." },
      { kind: "subheading", text: "4. Governing law" },
      { kind: "paragraph", text: `This agreement is governed by the laws of the State of ${rng.pick(TOWNS)}. Signed by the parties on the date above.` },
      ...(rng.chance(0.4) ? [{ kind: "pageBreak" as const }, { kind: "subheading" as const, text: "Signatures" }] : []),
      { kind: "lines", lines: [`Landlord: ${landlord}`, `Tenant: ${ctx.client}`, `By: ${ctx.contact}`] },
    ],
  };
};

const serviceAgreement: Template = (ctx) => {
  const { rng } = ctx;
  const other = rng.pick(COUNTERPARTIES);
  return {
    fileStem: rng.pick(["services agreement", "supply agreement", "contract"]),
    blocks: [
      { kind: "heading", text: rng.pick(["MASTER SERVICES AGREEMENT", "Supply Agreement", "Equipment Rental Agreement"]) },
      { kind: "paragraph", text: `This agreement dated ${dated(ctx)} is between ${ctx.client} and ${other}. Each is a party and together they are the parties.` },
      ...identifiers(ctx),
      { kind: "paragraph", text: `${other} will provide the services in Schedule A. Fees are ${formatMoney(rng.int(60, 240))} per hour, invoiced monthly and payable within 30 days.` },
      { kind: "paragraph", text: `The term of this agreement is ${rng.int(12, 36)} months. Either party may terminate for convenience on ${rng.pick([30, 60, 90])} days' notice. Confidential information stays confidential after termination.` },
      { kind: "paragraph", text: `Governing law: the State of ${rng.pick(TOWNS)}. Disputes go first to mediation.` },
      ...(rng.chance(0.5) ? [{ kind: "pageBreak" as const }, { kind: "subheading" as const, text: "Schedule A - Services" }, { kind: "paragraph" as const, text: "Delivery, installation, maintenance and support as requested by the customer in writing." }] : []),
      { kind: "lines", lines: [`For ${ctx.client}: ${ctx.contact}`, `For ${other}: ${pickPerson(rng)}`] },
    ],
  };
};

export const LEGAL_TEMPLATES: Record<string, Template[]> = {
  "Engagement & fee letters": [engagementLetter, engagementLetter, feeChangeLetter],
  "Contracts & leases": [lease, lease, serviceAgreement],
};
