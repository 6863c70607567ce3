// Court filings and wills & trust papers. A complaint over a lease, and a trustee's letter to
// beneficiaries, are the look-alikes here.
import { COUNTERPARTIES, COURTS, GIVEN, FAMILY, TOWNS, pickPerson } from "../people";
import { formatMoney } from "../random";
import { addressee, dated, identifiers, salutation, signOff, type Template } from "./parts";

/** The trust a paper is about: the client itself, or a family trust holding the client's shares. */
const trustOf = (ctx: Parameters<Template>[0]) => (/trust/i.test(ctx.client) ? `the ${ctx.client}` : `the ${ctx.rng.pick(FAMILY)} Family Trust, which holds the shares of ${ctx.client},`);

const caption = (ctx: Parameters<Template>[0], plaintiff: string, defendant: string) => {
  const { rng } = ctx;
  return [
    { kind: "lines" as const, lines: [rng.pick(COURTS).toUpperCase(), `Case No. ${rng.int(24, 26)}-${rng.pick(["CV", "CIV", "PR", "C"])}-${rng.int(100, 9999)}`], align: "center" as const },
    { kind: "lines" as const, lines: [`${plaintiff}, Plaintiff,`, "v.", `${defendant}, Defendant.`] },
  ];
};

const motion: Template = (ctx) => {
  const { rng } = ctx;
  const other = rng.pick(COUNTERPARTIES);
  const [p, d] = rng.chance(0.5) ? [ctx.client, other] : [other, ctx.client];
  const kind = rng.pick(["MOTION TO DISMISS", "MOTION FOR SUMMARY JUDGMENT", "MOTION TO COMPEL DISCOVERY", "NOTICE OF HEARING", "ORDER GRANTING EXTENSION OF TIME"]);
  return {
    fileStem: rng.pick([kind.toLowerCase(), "court filing", `filed ${dated(ctx)}`]),
    blocks: [
      ...caption(ctx, p, d),
      { kind: "heading", text: kind },
      ...identifiers(ctx),
      { kind: "paragraph", text: rng.pick([`The ${ctx.client === p ? "Plaintiff" : "Defendant"} respectfully moves the Court for an order as set out below, and in support states as follows.`, "IT IS HEREBY ORDERED that the motion is granted. The parties shall file a joint status report within fourteen days.", "PLEASE TAKE NOTICE that the motion will be heard before the Court on the date below, or as soon after as counsel may be heard."]) },
      { kind: "paragraph", text: `1. This action arises from ${rng.pick(["unpaid freight charges", "a breach of the lease agreement", "a disputed invoice", "the termination of a supply contract"])} totalling ${formatMoney(rng.money(5000, 250000))}.` },
      { kind: "paragraph", text: "2. The Defendant has not answered the interrogatories served on it, and the Plaintiff asks the Court to compel discovery." },
      { kind: "lines", lines: [`Dated: ${dated(ctx)}`, `${pickPerson(rng)}, Attorney for the ${ctx.client === p ? "Plaintiff" : "Defendant"}`, `Bar No. ${rng.int(10000, 99999)}`] },
    ],
  };
};

/** A look-alike: a complaint about a lease, full of contract words. */
const leaseComplaint: Template = (ctx) => {
  const { rng } = ctx;
  const landlord = rng.pick(COUNTERPARTIES);
  return {
    fileStem: rng.pick(["complaint", "complaint for breach of lease"]),
    blocks: [
      ...caption(ctx, landlord, ctx.client),
      { kind: "heading", text: "COMPLAINT FOR BREACH OF LEASE" },
      { kind: "paragraph", text: `1. The Plaintiff and the Defendant are parties to a lease agreement dated ${dated(ctx)} for premises in ${rng.pick(TOWNS)}. The term of the lease is five years.` },
      { kind: "paragraph", text: `2. The Defendant failed to pay rent of ${formatMoney(rng.money(2000, 9000))} per month and did not cure after notice of termination. The Plaintiff asks the Court for damages and costs.` },
      ...identifiers(ctx),
    ],
  };
};

const will: Template = (ctx) => {
  const { rng } = ctx;
  const testator = pickPerson(rng);
  const executor = pickPerson(rng);
  const heirs = [0, 1, 2].map(() => `${rng.pick(GIVEN)} ${rng.pick(FAMILY)}`);
  return {
    fileStem: rng.pick(["last will", `will of ${testator}`, "codicil"]),
    blocks: [
      { kind: "heading", text: rng.pick([`LAST WILL AND TESTAMENT OF ${testator.toUpperCase()}`, `FIRST CODICIL TO THE WILL OF ${testator.toUpperCase()}`]) },
      { kind: "paragraph", text: `I, ${testator}, of ${rng.pick(TOWNS)}, being of sound mind, declare this to be my last will and testament and revoke all earlier wills and codicils.` },
      { kind: "paragraph", text: `I appoint ${executor} as executor of this will, and if unable to act, ${pickPerson(rng)}.` },
      { kind: "paragraph", text: `I give my residuary estate to the trustee of ${trustOf(ctx)} to hold for the beneficiaries ${heirs.join(", ")} in equal shares.` },
      ...identifiers(ctx),
      ...(rng.chance(0.4) ? [{ kind: "pageBreak" as const }] : []),
      { kind: "lines", lines: [`Signed on ${dated(ctx)}`, testator, "Witnesses:", pickPerson(rng), pickPerson(rng)] },
    ],
  };
};

const trustDeed: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["trust amendment", "trust instrument", "certificate of trust"]),
    blocks: [
      { kind: "heading", text: rng.pick(["AMENDMENT TO TRUST AGREEMENT", "CERTIFICATION OF TRUST", "DECLARATION OF TRUST"]) },
      { kind: "paragraph", text: `The settlor and the trustee of ${trustOf(ctx)} amend the trust as follows, effective ${dated(ctx)}.` },
      { kind: "paragraph", text: `The trustee shall distribute the net income to the beneficiaries at least quarterly and may distribute principal for health, education and maintenance. ${pickPerson(rng)} is appointed successor trustee.` },
      ...identifiers(ctx),
      { kind: "lines", lines: ["Settlor: " + pickPerson(rng), "Trustee: " + pickPerson(rng), "Notary public"] },
    ],
  };
};

/** A look-alike: a trustee's letter to beneficiaries, in letter form. */
const trusteeLetter: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["letter to beneficiaries", "trustee letter"]),
    blocks: [
      addressee(ctx),
      salutation(ctx),
      { kind: "paragraph", text: `As trustee of ${trustOf(ctx)} I enclose the annual account. Distributions to each beneficiary this year came to ${formatMoney(rng.money(2000, 40000))}. Please let me know if you have questions.` },
      ...identifiers(ctx),
      signOff(ctx, "Trustee"),
    ],
  };
};

export const COURT_ESTATE_TEMPLATES: Record<string, Template[]> = {
  "Court filings": [motion, motion, leaseComplaint],
  "Wills & trust papers": [will, trustDeed, trustDeed, trusteeLetter],
};
