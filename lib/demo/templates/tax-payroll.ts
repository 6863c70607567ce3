// Tax-authority notices and payroll records. A notice about payroll withholding and a payroll
// register that lists tax deposits share many words on purpose.
import { clientEmail, matterRef, taxIdLine } from "../context";
import { AUTHORITIES, GIVEN, FAMILY, pickPerson } from "../people";
import { formatDate, formatMoney } from "../random";
import { addressee, dated, identifiers, letterhead, salutation, signOff, type Template } from "./parts";

const noticeKinds = [
  { title: "Notice of Proposed Assessment", body: "Our records show that the income reported on your return does not match the information we received. We propose an adjustment that increases the tax due." },
  { title: "Notice of Balance Due", body: "You have an unpaid balance on your account for the tax year shown. Interest continues to accrue until the balance is paid in full." },
  { title: "Notice of Penalty Charge", body: "We charged a penalty because your return was filed after the due date. You may ask us to remove the penalty if you had reasonable cause." },
  { title: "Audit Notification", body: "Your return for the tax year shown has been selected for examination. Please gather the records listed below and contact the examiner to arrange an appointment." },
];

const taxNotice: Template = (ctx) => {
  const { rng } = ctx;
  const kind = rng.pick(noticeKinds);
  const year = ctx.date.getUTCFullYear() - rng.int(1, 3);
  const due = rng.money(80, 18000);
  return {
    fileStem: rng.pick(["tax notice", `notice ${rng.pick(["CP", "N", "ST"])}${rng.int(10, 599)}`, "revenue letter"]),
    blocks: [
      letterhead(ctx, rng.pick(AUTHORITIES)),
      { kind: "heading", text: kind.title },
      { kind: "lines", lines: [`Notice date: ${dated(ctx)}`, `Tax year: ${year}`, `Taxpayer: ${ctx.client}`, ...taxIdLine(ctx), `Notice number: ${rng.int(100000, 999999)}`] },
      { kind: "paragraph", text: kind.body },
      { kind: "table", rows: [["Tax", formatMoney(due * 0.8)], ["Penalty", formatMoney(due * 0.15)], ["Interest", formatMoney(due * 0.05)], ["Balance due", formatMoney(due)]] },
      { kind: "paragraph", text: rng.pick([`Pay the balance due by ${formatDate(new Date(ctx.date.getTime() + 21 * 86_400_000), 0)} to avoid further penalties and interest.`, "If you disagree, you may request a review within 30 days of the date of this notice.", "If you already paid, please disregard this notice."]) },
      ...identifiers(ctx),
    ],
  };
};

/** A look-alike: a notice about payroll withholding deposits, close to payroll records. */
const withholdingNotice: Template = (ctx) => {
  const { rng } = ctx;
  const quarter = rng.int(1, 4);
  return {
    fileStem: rng.pick(["withholding notice", "employment tax notice"]),
    blocks: [
      letterhead(ctx, rng.pick(AUTHORITIES)),
      addressee(ctx),
      { kind: "subheading", text: `Employer withholding - quarter ${quarter}` },
      salutation(ctx),
      { kind: "paragraph", text: `Our records show that the withholding deposits for your payroll in quarter ${quarter} do not match the wages reported. The difference is ${formatMoney(rng.money(100, 5000))}. A penalty may apply if the tax year is not reconciled.` },
      ...identifiers(ctx),
      signOff(ctx, "Revenue Officer"),
    ],
  };
};

const employees = (n: number, rng: { pick<T>(a: readonly T[]): T }) => Array.from({ length: n }, () => `${rng.pick(GIVEN)} ${rng.pick(FAMILY)}`);

const payslip: Template = (ctx) => {
  const { rng } = ctx;
  const gross = rng.money(900, 6200);
  const fed = gross * rng.pick([0.1, 0.12, 0.15]);
  const state = gross * 0.04;
  const fica = gross * 0.0765;
  return {
    fileStem: rng.pick(["payslip", "pay stub", `earnings statement ${formatDate(ctx.date, 1)}`]),
    blocks: [
      letterhead(ctx, ctx.client),
      { kind: "heading", text: rng.pick(["Earnings Statement", "Payslip", "Pay Stub"]) },
      { kind: "lines", lines: [`Employee: ${pickPerson(rng)}`, `Employee ID: E-${rng.int(100, 999)}`, `Pay period: ${dated(ctx)} (${rng.pick(["biweekly", "semi-monthly", "weekly"])})`, `Pay date: ${dated(ctx)}`] },
      { kind: "table", header: true, rows: [["Item", "Current", "Year to date"], ["Gross pay", formatMoney(gross), formatMoney(gross * 7)], ["Federal income tax withholding", formatMoney(fed), formatMoney(fed * 7)], ["State withholding", formatMoney(state), formatMoney(state * 7)], ["Social security and Medicare", formatMoney(fica), formatMoney(fica * 7)], ["Net pay", formatMoney(gross - fed - state - fica), formatMoney((gross - fed - state - fica) * 7)]] },
      ...identifiers(ctx),
    ],
  };
};

const payrollRegister: Template = (ctx) => {
  const { rng } = ctx;
  const rows = employees(rng.int(4, 14), rng).map((name) => {
    const gross = rng.money(800, 5200);
    return [name, formatMoney(rng.int(20, 80)), formatMoney(gross), formatMoney(gross * 0.21), formatMoney(gross * 0.79)];
  });
  return {
    fileStem: rng.pick(["payroll register", "payroll summary", `payroll ${formatDate(ctx.date, 1)}`]),
    blocks: [
      { kind: "heading", text: rng.pick(["Payroll Register", "Payroll Summary Report", "Payroll Journal"]) },
      { kind: "lines", lines: [`Company: ${ctx.client}`, `Pay period ending ${dated(ctx)}`, ...taxIdLine(ctx), ...matterRef(ctx), ...clientEmail(ctx)] },
      { kind: "table", header: true, rows: [["Employee", "Hours", "Gross pay", "Withholding", "Net pay"], ...rows] },
      { kind: "paragraph", text: rng.pick(["Employer tax deposits for this pay period are scheduled for the next banking day.", "Totals include overtime and paid leave. Direct deposits are released on the pay date.", "Prepared by the payroll service. Review and approve before the cut-off."]) },
    ],
  };
};

const wageStatement: Template = (ctx) => {
  const { rng } = ctx;
  const wages = rng.money(18000, 96000);
  return {
    fileStem: rng.pick(["W-2 copy", "wage statement", "annual wage summary"]),
    blocks: [
      { kind: "heading", text: rng.pick(["Form W-2 Wage and Tax Statement (copy for employee records)", "Annual Wage and Withholding Summary"]) },
      { kind: "lines", lines: [`Employer: ${ctx.client}`, ...taxIdLine(ctx), `Employee: ${pickPerson(rng)}`, `Year: ${ctx.date.getUTCFullYear() - 1}`] },
      { kind: "table", rows: [["Wages, tips, other compensation", formatMoney(wages)], ["Federal income tax withheld", formatMoney(wages * 0.13)], ["Social security wages", formatMoney(wages)], ["State wages", formatMoney(wages)], ["State income tax", formatMoney(wages * 0.04)]] },
      ...identifiers(ctx),
    ],
  };
};

export const TAX_PAYROLL_TEMPLATES: Record<string, Template[]> = {
  "Tax-authority notices": [taxNotice, taxNotice, taxNotice, withholdingNotice],
  "Payroll records": [payslip, payrollRegister, wageStatement],
};

