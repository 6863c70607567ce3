// Invoices & receipts and bank & card statements. One invoice variant is a thank-you letter for a
// payment and one statement lists rent under a lease, so a classifier meets honest look-alikes.
import { clientEmail, matterRef, taxIdLine } from "../context";
import { BANKS, CARDS, OFFICE, VENDORS } from "../people";
import { formatDate, formatMoney, monthName } from "../random";
import type { Block } from "../doc-model";
import { addressee, dated, letterhead, officeLetterhead, pickSome, salutation, signOff, type Template } from "./parts";

const ITEMS = ["Bread flour, 25 kg sacks", "Proving baskets", "Walk-in cooler service visit", "Courier, same day", "Printer toner", "Linen hire, weekly", "Compostable boxes, case of 200", "Electrical inspection", "Bookkeeping, monthly", "Payroll processing", "Dental supplies, assorted", "Pallet storage, per week"];

// A second page of standard terms, as many suppliers print on the back of an invoice.
const TERMS_PAGE: Block[] = [
  { kind: "pageBreak" },
  { kind: "subheading", text: "Terms and conditions of sale" },
  { kind: "paragraph", text: "1. Invoices are payable within the period stated on the front. Overdue amounts bear interest at 1.5% per month." },
  { kind: "paragraph", text: "2. Title to goods passes on payment in full. Claims for shortages must be made within seven days of delivery." },
  { kind: "paragraph", text: "3. Queries about this invoice should be sent to the accounts department, quoting the invoice number." },
];

const invoice: Template = (ctx) => {
  const { rng } = ctx;
  const vendor = rng.pick(VENDORS);
  const no = `${rng.pick(["INV", "", "No. ", "#"])}${rng.int(1000, 99999)}`;
  const lines = pickSome(ctx, ITEMS, rng.int(2, 6)).map((item) => {
    const qty = rng.int(1, 12);
    const price = rng.money(8, 420);
    return [item, String(qty), formatMoney(price), formatMoney(qty * price)];
  });
  const subtotal = lines.reduce((s, l) => s + Number(l[3].replace(/,/g, "")), 0);
  const tax = Math.round(subtotal * rng.pick([0, 0.05, 0.0725, 0.08]) * 100) / 100;
  return {
    fileStem: rng.pick([`invoice ${no}`, `${vendor} invoice`, `inv ${no}`]),
    blocks: [
      letterhead(ctx, vendor, [`accounts@${vendor.toLowerCase().replace(/[^a-z]/g, "")}.example`]),
      { kind: "heading", text: rng.pick(["INVOICE", "Tax Invoice", "Invoice", "BILL"]) },
      { kind: "lines", lines: [`Invoice number: ${no}`, `Invoice date: ${dated(ctx)}`, `Bill to: ${ctx.client}`, ...clientEmail(ctx), ...matterRef(ctx)] },
      { kind: "table", header: true, rows: [["Description", "Qty", "Unit price", "Amount"], ...lines] },
      { kind: "lines", lines: [`Subtotal: ${formatMoney(subtotal)}`, `Sales tax: ${formatMoney(tax)}`, `Amount due: ${formatMoney(subtotal + tax)}`], align: "right" },
      ...(rng.chance(0.3) ? TERMS_PAGE : []),
      { kind: "paragraph", text: rng.pick([`Payment terms: net ${rng.pick([14, 30, 45])} days. Please remit to the account below and quote the invoice number.`, "Please pay by bank transfer within 30 days. Late payments may incur a charge of 1.5% per month.", "Thank you for your business. Remit payment to the address above."]) },
    ],
  };
};

const receipt: Template = (ctx) => {
  const { rng } = ctx;
  const amount = rng.money(20, 2400);
  return {
    fileStem: rng.pick(["receipt", "payment receipt", `receipt ${rng.int(100, 9999)}`]),
    blocks: [
      letterhead(ctx, rng.pick(VENDORS)),
      { kind: "heading", text: rng.pick(["RECEIPT", "Payment Receipt", "Official Receipt"]) },
      { kind: "lines", lines: [`Receipt no. R-${rng.int(10000, 99999)}`, `Date: ${dated(ctx)}`, `Received from: ${ctx.client}`, ...matterRef(ctx)] },
      { kind: "table", rows: [["Payment received", formatMoney(amount)], ["Method", rng.pick(["Card ending 0" + rng.int(100, 999), "Cheque", "Bank transfer", "Cash"])], ["Balance remaining", "0.00"]] },
      { kind: "paragraph", text: "This receipt confirms payment in full of the invoice listed above. Please keep it for your records." },
    ],
  };
};

/** A look-alike: a thank-you letter for a payment, with the receipt details in prose. */
const paymentLetter: Template = (ctx) => {
  const { rng } = ctx;
  return {
    fileStem: rng.pick(["payment confirmation", "letter re payment"]),
    blocks: [
      officeLetterhead(ctx),
      addressee(ctx),
      salutation(ctx),
      { kind: "paragraph", text: `Thank you for your payment of ${formatMoney(rng.money(200, 6000))} received on ${dated(ctx)} against our invoice ${rng.int(2000, 9000)}. Your account with ${OFFICE.name} is now settled and no amount is due.` },
      signOff(ctx, "Accounts"),
    ],
  };
};

const bankStatement: Template = (ctx) => {
  const { rng } = ctx;
  let balance = rng.money(1000, 60000);
  const opening = balance;
  const rows = Array.from({ length: rng.int(6, 16) }, (_, i) => {
    const credit = rng.chance(0.35);
    const amount = rng.money(15, credit ? 9000 : 2500);
    balance += credit ? amount : -amount;
    const what = credit ? rng.pick(["Deposit - card sales", "Transfer in", "Mobile deposit", "Interest"]) : rng.pick(["Debit card purchase", "ACH payment", "Cheque paid", "Service fee", `Rent - ${rng.pick(["Quay Road", "Tanner Lane"])} lease`, "Payroll run", "Utility payment"]);
    return [`${monthName(ctx.date).slice(0, 3)} ${i * 2 + 1}  ${what}`, credit ? formatMoney(amount) : "", credit ? "" : formatMoney(amount), formatMoney(balance)];
  });
  const card = rng.chance(0.3);
  return {
    fileStem: rng.pick([`${card ? "card" : "bank"} statement ${monthName(ctx.date)}`, "statement", `stmt ${formatDate(ctx.date, 1).slice(0, 7)}`]),
    blocks: [
      letterhead(ctx, card ? rng.pick(CARDS) : rng.pick(BANKS)),
      { kind: "heading", text: card ? "Card Account Statement" : rng.pick(["Business Checking Statement", "Account Statement", "Monthly Statement"]) },
      { kind: "lines", lines: [ctx.client, `Account number: ****${rng.int(1000, 9999)}`, `Statement period: ${monthName(ctx.date)} 1 to ${monthName(ctx.date)} 30`, ...taxIdLine(ctx)] },
      { kind: "table", rows: [["Opening balance", formatMoney(opening)], ["Closing balance", formatMoney(balance)]] },
      ...(rows.length > 10 ? [{ kind: "pageBreak" as const }] : []),
      { kind: "table", header: true, rows: [["Date  Description", "Deposits", "Withdrawals", "Balance"], ...rows] },
      ...(rng.chance(0.3) ? [{ kind: "pageBreak" as const }, { kind: "subheading" as const, text: "Important information about your account" }, { kind: "paragraph" as const, text: "In case of errors or questions about your electronic transfers, write to us at the address on page one as soon as you can. We must hear from you no later than 60 days after we sent the first statement on which the problem appeared." }] : []),
      { kind: "paragraph", text: rng.pick(["Please examine this statement promptly and report any discrepancy within 60 days.", "Deposits are insured up to the applicable limits. Questions? Call the number on the back of your card.", "Minimum payment due on the 25th. Interest is charged on balances not paid in full."]) },
    ],
  };
};

export const MONEY_TEMPLATES: Record<string, Template[]> = {
  "Invoices & receipts": [invoice, invoice, receipt, paymentLetter],
  "Bank & card statements": [bankStatement, bankStatement],
};

