// Arranges filed documents with an original in the test bucket, filed long enough ago to be
// past their retention date, for the holds and disposal tests.
import crypto from "node:crypto";
import type { Knex } from "knex";
import { putObject } from "@/storage/s3";
import { insertReadDocument } from "./filed-documents";

export interface StoredDoc {
  id: number;
  key: string;
  name: string;
}

/** A filed document in `matterNumber` and cabinet type `typeName`, filed on `filedAt`, its original in the bucket. */
export async function insertStoredFiledDocument(db: Knex, o: { matterNumber: string; typeName: string; filedAt: Date; label: string }): Promise<StoredDoc> {
  const matter = await db("matters").where({ number: o.matterNumber }).first("id");
  const type = await db("cabinet_types").where({ name: o.typeName }).first("id");
  const partner = await db("users").where({ email: "partner@example.com" }).first("id");
  const key = `test/records/${crypto.randomUUID()}`;
  const name = `${o.label}-${crypto.randomUUID().slice(0, 6)}.pdf`;
  await putObject(key, Buffer.from(`%PDF-1.4 original of ${name}`), { contentType: "application/pdf" });
  const id = await insertReadDocument(db, `Invoice ${name}: amount due, remit payment.`, name, {
    storage_key: key,
    matter_id: matter.id,
    cabinet_type_id: type.id,
    filed_by: partner.id,
    filed_at: o.filedAt,
    filed_how: "by_hand",
  });
  await db("document_matter_links").insert({ document_id: id, matter_id: matter.id, how: "filed" }).onConflict().ignore();
  return { id, key, name };
}

/** A second admin (the demo office has one), for "another admin approves". */
export async function ensureSecondAdmin(db: Knex): Promise<{ id: number; email: string; name: string; role: "admin" }> {
  const email = "second-admin@example.com";
  const row = await db("users").where({ email }).first("id");
  const id = row?.id ?? (await db("users").insert({ email, name: "Imogen Tarrant", role: "admin", password_hash: "x".repeat(60) }))[0];
  return { id, email, name: "Imogen Tarrant", role: "admin" };
}

export const yearsAgo = (years: number) => new Date(Date.UTC(new Date().getUTCFullYear() - years, 0, 15, 10));
