import { describe, expect, it } from "vitest";
import { DEMO_CABINET_TYPES } from "@/db/demo/cabinet-types";
import { buildTypeProfiles, rankByDescription, rankByProfiles } from "@/lib/filing/cold-start";

const TYPES = DEMO_CABINET_TYPES.map((t, i) => ({ id: 101 + i, name: t.name, description: t.description, keywords: t.keywords }));
const PROFILES = buildTypeProfiles(TYPES);
const idOf = (name: string) => TYPES.find((t) => t.name === name)!.id;
const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

// Invented documents, each plainly of one type.
const CASES: [string, string][] = [
  ["Invoices & receipts", "INVOICE No. 2291\nBill to: Harrow Lane Florists\nSubtotal $1,200.00\nAmount due $1,296.00\nPlease remit within 30 days."],
  ["Bank & card statements", "Statement period 1–31 March. Opening balance 4,210.55. Deposits 12,000.00. Withdrawals 9,100.00. Closing balance 7,110.55."],
  ["Tax-authority notices", "Department of Revenue. Notice of proposed assessment for tax year 2024. A penalty of $310 applies; the balance due is payable by 1 June."],
  ["Payroll records", "Payslip. Pay period 1–15 May. Gross pay 3,100.00; federal withholding 412.00; net pay 2,388.00."],
  ["Court filings", "IN THE DISTRICT COURT OF WESTMERE COUNTY. Plaintiff v. Defendant. Case No. 26-CV-114. Motion to dismiss."],
  ["Wills & trust papers", "Last will and testament. I appoint my sister as executor and name my two children as the beneficiaries."],
  ["Corporate minutes", "Minutes of the meeting of the board of directors. A quorum was present. Resolution: the shareholders approve the budget."],
  ["Contracts & leases", "This lease agreement is made between the parties. Term: five years. Termination on ninety days' notice. Governing law: the state."],
  ["Engagement & fee letters", "Terms of engagement. Our scope of services covers the annual accounts; our hourly rate is $180 and we ask for a retainer."],
  ["Correspondence", "Dear Mr Abernathy, thank you for your letter of 3 May. We will follow up next week. Kind regards, Ines Calloway"],
];

describe("rankByDescription", () => {
  it.each(CASES)("puts an invented %s document on its own type", (expected, text) => {
    const result = rankByDescription({ text }, TYPES);
    expect(result.ranked[0].cabinetTypeId).toBe(idOf(expected));
    expect(result.terms.length).toBeGreaterThan(0);
  });

  it("ranks every type once with confidences that sum to 1 and follow the scores", () => {
    const { ranked } = rankByProfiles({ text: CASES[0][1] }, PROFILES);
    expect(ranked.map((r) => r.cabinetTypeId).sort()).toEqual(TYPES.map((t) => t.id));
    expect(sum(ranked.map((r) => r.confidence))).toBeCloseTo(1, 12);
    for (let i = 1; i < ranked.length; i++) {
      expect(ranked[i].score).toBeLessThanOrEqual(ranked[i - 1].score);
      expect(ranked[i].confidence).toBeLessThanOrEqual(ranked[i - 1].confidence);
    }
    for (const r of ranked) {
      expect(r.score).toBeGreaterThanOrEqual(0);
      expect(r.score).toBeLessThanOrEqual(1 + 1e-12);
    }
  });

  it("names the matched terms of the top type as the model's stems", () => {
    const { terms } = rankByProfiles({ text: CASES[0][1] }, PROFILES);
    expect(terms).toContain("invoic");
    expect(terms).toContain("amount due");
  });

  it("reads the file name as words", () => {
    const result = rankByProfiles({ text: "Please see the attached.", filename: "2026-03_bank_statement.pdf" }, PROFILES);
    expect(result.ranked[0].cabinetTypeId).toBe(idOf("Bank & card statements"));
  });

  it("leaves every type at 1/n, in the given order, for empty text", () => {
    const { ranked, terms } = rankByProfiles({ text: "" }, PROFILES);
    expect(ranked.map((r) => r.cabinetTypeId)).toEqual(TYPES.map((t) => t.id));
    for (const r of ranked) expect(r).toMatchObject({ score: 0, confidence: 1 / TYPES.length });
    expect(terms).toEqual([]);
  });

  it("breaks a tie between identical profiles by the order of the types", () => {
    const twins = [
      { id: 7, name: "Receipts", description: "Proofs of payment.", keywords: ["receipt"] },
      { id: 3, name: "Receipts", description: "Proofs of payment.", keywords: ["receipt"] },
    ];
    const { ranked } = rankByDescription({ text: "Receipt: payment received, thank you." }, twins);
    expect(ranked.map((r) => r.cabinetTypeId)).toEqual([7, 3]);
    expect(ranked[0].confidence).toBeCloseTo(0.5, 12);
  });

  it("gives a single type all the confidence, and an empty type list an empty ranking", () => {
    const one = rankByDescription({ text: "anything at all" }, [TYPES[0]]);
    expect(one.ranked).toEqual([{ cabinetTypeId: TYPES[0].id, score: expect.any(Number), confidence: 1 }]);
    expect(rankByDescription({ text: "an invoice" }, [])).toEqual({ ranked: [], terms: [] });
  });
});
