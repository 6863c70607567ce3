// Arranges read (and optionally filed) documents directly in the test database, with texts
// that a classifier can learn, so the filing loop can be tested without files or OCR.
import crypto from "node:crypto";
import type { Knex } from "knex";

const VOCAB: Record<string, string[]> = {
  "Invoices & receipts": ["invoice", "amount due", "subtotal", "remit payment", "receipt", "tax rate", "line item", "net 30"],
  "Bank & card statements": ["statement period", "opening balance", "closing balance", "deposits", "withdrawals", "account summary", "interest earned"],
  "Contracts & leases": ["agreement", "lease", "landlord", "tenant", "term of years", "governing law", "termination clause", "premises"],
  "Payroll records": ["payroll", "gross pay", "net pay", "withholding", "pay period", "employee", "overtime hours"],
};

export const TRAINING_TYPES = Object.keys(VOCAB);

// Fixed seeds (not random) so every run arranges the same texts.
let nextSeed = 1_000;

function textFor(type: string, seed: number, noise = 0): string {
  const words = VOCAB[type];
  const others = Object.values(VOCAB).flat();
  const parts: string[] = [];
  for (let i = 0; i < 14; i++) {
    const useNoise = ((seed * 31 + i * 17) % 100) / 100 < noise;
    const pool = useNoise ? others : words;
    parts.push(pool[(seed * 7 + i * 5) % pool.length]);
  }
  return `Document ${seed}. ${parts.join(". ")}.`;
}

export async function typeIds(db: Knex): Promise<Map<string, number>> {
  return new Map((await db("cabinet_types").select("id", "name")).map((r) => [r.name, r.id]));
}

/** One read document row with this text (filed when `filing` is given); returns its id. */
export async function insertReadDocument(db: Knex, text: string, name: string, filing: Record<string, unknown> = {}): Promise<number> {
  const clerk = await db("users").where({ email: "clerk@example.com" }).first("id");
  const [id] = await db("documents").insert({
    sha256: crypto.createHash("sha256").update(text + crypto.randomUUID()).digest("hex"),
    original_name: name,
    media_type: "application/pdf",
    size_bytes: text.length,
    storage_key: `test/${crypto.randomUUID()}`,
    status: "ready",
    text,
    page_count: 1,
    char_count: text.length,
    uploaded_by: clerk.id,
    ...filing,
  });
  return id;
}

/** Inserts `perType` human-filed documents for each training type; returns their ids. */
export async function insertFiledDocuments(db: Knex, perType: number, options: { noise?: number; how?: string } = {}): Promise<number[]> {
  const ids = await typeIds(db);
  const clerk = await db("users").where({ email: "clerk@example.com" }).first("id");
  const matter = await db("matters").where({ number: "AQ-2026-0101" }).first("id");
  const out: number[] = [];
  let seed = nextSeed;
  nextSeed += 10_000;
  for (const type of TRAINING_TYPES) {
    for (let i = 0; i < perType; i++) {
      const text = textFor(type, seed++, options.noise ?? 0.15);
      const filing = { cabinet_type_id: ids.get(type), matter_id: matter.id, filed_by: clerk.id, filed_at: new Date(), filed_how: options.how ?? "by_hand" };
      out.push(await insertReadDocument(db, text, `${type.split(" ")[0].toLowerCase()}-${seed}.pdf`, filing));
    }
  }
  return out;
}

/** Inserts a read, unfiled document of the given type's wording; returns its id. */
export function insertUnfiledDocument(db: Knex, type: string, extra = ""): Promise<number> {
  return insertReadDocument(db, `${textFor(type, nextSeed++, 0)} ${extra}`, `incoming-${crypto.randomUUID().slice(0, 8)}.pdf`);
}
