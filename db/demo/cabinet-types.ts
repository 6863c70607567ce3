// The cabinet types shipped with the demo office, with retention defaults. Each default names
// where it comes from; "common practice" means no single rule sets it, and "(from memory)" means
// the figure was recalled, not re-read from the source. These are defaults only: confirm them
// against your jurisdiction's rules and your professional body before destroying any record;
// a legal hold always stops destruction.

export interface CabinetTypeSeed {
  name: string;
  description: string;
  keywords: string[];
  retentionYears: number | null;
  retentionTrigger: "after_filing" | "after_matter_close" | "permanent";
  retentionSource: string;
}


export const DEMO_CABINET_TYPES: CabinetTypeSeed[] = [
  {
    name: "Engagement & fee letters",
    description: "Letters that start an engagement, set its scope and fees, and any later change to them.",
    keywords: ["engagement", "scope of services", "fee", "retainer", "terms of engagement", "hourly rate"],
    retentionYears: 7,
    retentionTrigger: "after_matter_close",
    retentionSource: "Common practice. ABA Model Rule 1.15 asks for trust-account records for five years after the representation ends (from memory).",
  },
  {
    name: "Invoices & receipts",
    description: "Bills the office or the client received or issued, and proofs of payment.",
    keywords: ["invoice", "receipt", "amount due", "payment received", "remit", "subtotal"],
    retentionYears: 7,
    retentionTrigger: "after_filing",
    retentionSource: "IRS Publication 583: keep records 3 years, 7 for bad-debt or worthless-securities claims (from memory); 7 is common practice.",
  },
  {
    name: "Bank & card statements",
    description: "Monthly or periodic statements from banks and card issuers.",
    keywords: ["statement period", "opening balance", "closing balance", "account number", "deposits", "withdrawals"],
    retentionYears: 7,
    retentionTrigger: "after_filing",
    retentionSource: "Common practice, covering the IRS's 6-year limitation for a substantial understatement of income (IRC §6501(e), from memory).",
  },
  {
    name: "Tax-authority notices",
    description: "Letters and notices from tax authorities: assessments, adjustments, audits, penalties.",
    keywords: ["notice", "internal revenue service", "tax year", "assessment", "penalty", "balance due"],
    retentionYears: 7,
    retentionTrigger: "after_filing",
    retentionSource: "IRC §6501 limitation periods of 3 and 6 years (from memory); 7 is common practice.",
  },
  {
    name: "Payroll records",
    description: "Payslips, payroll registers, withholding forms and year-end wage statements.",
    keywords: ["payroll", "gross pay", "net pay", "withholding", "w-2", "pay period"],
    retentionYears: 4,
    retentionTrigger: "after_filing",
    retentionSource: "IRS Publication 15 (Circular E): employment tax records at least 4 years (from memory); FLSA payroll records 3 years, 29 CFR 516.5 (from memory).",
  },
  {
    name: "Contracts & leases",
    description: "Signed agreements, leases, amendments and renewals.",
    keywords: ["agreement", "lease", "party", "term", "termination", "governing law"],
    retentionYears: 7,
    retentionTrigger: "after_matter_close",
    retentionSource: "Common practice; limitation periods for written contracts run 3 to 10 years by state (from memory).",
  },
  {
    name: "Court filings",
    description: "Pleadings, motions, orders and notices filed with or issued by a court.",
    keywords: ["court", "plaintiff", "defendant", "case no", "motion", "order"],
    retentionYears: 10,
    retentionTrigger: "after_matter_close",
    retentionSource: "Common practice.",
  },
  {
    name: "Wills & trust papers",
    description: "Wills, codicils, trust instruments and related estate papers.",
    keywords: ["last will", "testament", "trustee", "beneficiary", "executor", "codicil"],
    retentionYears: null,
    retentionTrigger: "permanent",
    retentionSource: "Common practice: originals are kept until returned to the client or the estate is settled.",
  },
  {
    name: "Corporate minutes",
    description: "Minutes and resolutions of boards, members and shareholders.",
    keywords: ["minutes", "board of directors", "resolution", "quorum", "shareholders", "meeting"],
    retentionYears: null,
    retentionTrigger: "permanent",
    retentionSource: "Model Business Corporation Act §16.01: minutes kept permanently (from memory).",
  },
  {
    name: "Correspondence",
    description: "Letters and e-mails to and from clients and others that fit no other cabinet type.",
    keywords: ["dear", "sincerely", "regards", "letter", "enclosed", "follow up"],
    retentionYears: 7,
    retentionTrigger: "after_matter_close",
    retentionSource: "Common practice.",
  },
];
