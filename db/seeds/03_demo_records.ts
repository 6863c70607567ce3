// Demo records for Holds and Disposal: a few invented papers of the bakery's matter filed years
// ago, so on a fresh office some are already past their retention date (Invoices & receipts and
// Bank & card statements keep 7 years after filing in the demo defaults). Runs once: it skips
// when its first document is there. Only with SEED_DEMO_DOCUMENTS on (the tests turn it off).
import crypto from "node:crypto";
import type { Knex } from "knex";
import PDFKit from "pdfkit";
import { env } from "../../lib/env";
import { appendFilingEvent } from "../../lib/data/record";
import { putObject } from "../../storage/s3";

const PAPERS = [
  { name: "marlowe-invoice-2016-0412.pdf", type: "Invoices & receipts", filed: "2016-04-14", text: "Invoice 2016-0412. Marlowe Street Bakery LLC. Flour and dairy supplies, April 2016. Amount due 1,284.50. Remit payment within 30 days." },
  { name: "marlowe-invoice-2017-0930.pdf", type: "Invoices & receipts", filed: "2017-10-02", text: "Invoice 2017-0930. Marlowe Street Bakery LLC. Oven servicing, September 2017. Amount due 640.00. Payment received with thanks." },
  { name: "marlowe-statement-2018-01.pdf", type: "Bank & card statements", filed: "2018-02-05", text: "Account statement, statement period January 2018. Marlowe Street Bakery LLC. Opening balance 12,004.17; deposits 8,410.00; withdrawals 7,902.55; closing balance 12,511.62." },
  { name: "marlowe-statement-2019-06.pdf", type: "Bank & card statements", filed: "2019-07-03", text: "Account statement, statement period June 2019. Marlowe Street Bakery LLC. Opening balance 15,220.40; deposits 9,870.00; withdrawals 9,114.85; closing balance 15,975.55." },
];

function pdf(text: string, created: Date): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFKit({ size: "LETTER", margin: 54, info: { Title: text.slice(0, 40), CreationDate: created } });
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.font("Helvetica").fontSize(11).text(text);
    doc.end();
  });
}

export async function seed(knex: Knex): Promise<void> {
  if (!env.seedDemoDocuments) return;
  if (await knex("documents").where({ original_name: PAPERS[0].name }).first("id")) return;
  const matter = await knex("matters").where({ number: "AQ-2026-0101" }).first("id");
  const clerk = await knex("users").where({ email: "clerk@example.com" }).first("id");
  if (!matter || !clerk) return;
  for (const p of PAPERS) {
    const filedAt = new Date(`${p.filed}T10:00:00Z`);
    const bytes = await pdf(p.text, filedAt);
    const sha256 = crypto.createHash("sha256").update(bytes).digest("hex");
    const key = `originals/demo/${sha256}`;
    await putObject(key, bytes, { contentType: "application/pdf", metadata: { sha256, "original-name": encodeURIComponent(p.name) } });
    const type = await knex("cabinet_types").where({ name: p.type }).first("id");
    const [id] = await knex("documents").insert({
      sha256, original_name: p.name, media_type: "application/pdf", size_bytes: bytes.byteLength, storage_key: key, status: "ready",
      text: p.text, page_count: 1, char_count: p.text.length, uploaded_by: clerk.id, uploaded_at: filedAt, read_at: filedAt,
      cabinet_type_id: type.id, matter_id: matter.id, filed_by: clerk.id, filed_at: filedAt, filed_how: "by_hand",
    });
    await appendFilingEvent(knex, { documentId: id, userId: clerk.id, action: "filed_by_hand", toCabinetTypeId: type.id, toMatterId: matter.id, reason: "Filed on paper before Foldwright; entered with the demo history.", createdAt: filedAt });
  }
}
