import "server-only";
// Each read document's term counts (table document_terms), tokenised once with lib/ml's
// tokenizer and kept with its TOKENIZER_VERSION. The reading job stores them with the text
// (lib/data/reading.ts); documents whose counts are missing or carry another version (rows
// written by a seed or an import, or a new tokenizer) are tokenised again by "tokenize" jobs,
// queued by `queueRetokenizing` at start-up and before each nightly retraining. A disposed
// document's counts go with its text.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { enqueueJob } from "@/lib/data/jobs";
import { withNamedLock } from "@/lib/data/locks";
import { TOKENIZE_JOB } from "@/lib/jobs/kinds";
import { findKindByMediaType } from "@/lib/intake";
import { countTerms, encodeTermCounts, TOKENIZER_VERSION, type MlDocument, type TermCounts } from "@/lib/ml";

/** Documents per "tokenize" job (about 2 ms each on this machine's synthetic office texts). */
export const TOKENIZE_BATCH = 250;

export interface DocumentTextRow {
  text: string;
  original_name: string;
  media_type: string;
  page_count: number | null;
  ocr_used: number | boolean;
}

/** The one place a stored document becomes lib/ml's document (reading, re-tokenising, suggesting). */
export function mlDocumentOf(row: DocumentTextRow): MlDocument {
  return {
    text: row.text,
    filename: row.original_name,
    meta: { kind: findKindByMediaType(row.media_type) ?? "other", pages: row.page_count ?? undefined, ocr: Boolean(row.ocr_used) },
  };
}

export interface TermsRow {
  document_id: number;
  tokenizer_version: number;
  has_letter: boolean;
  distinct_terms: number;
  counts: string;
}

/** Tokenises a document for storage (pure: call it outside the transaction that stores it). */
export function termsRowOf(documentId: number, row: DocumentTextRow): TermsRow {
  const counts: TermCounts = countTerms(mlDocumentOf(row));
  return {
    document_id: documentId,
    tokenizer_version: TOKENIZER_VERSION,
    has_letter: /\p{L}/u.test(row.text),
    distinct_terms: counts.size,
    counts: encodeTermCounts(counts),
  };
}

/** Inserts or replaces term rows (in the caller's transaction when given). */
export async function storeTerms(rows: TermsRow[], db: Knex | Knex.Transaction = getDb()): Promise<void> {
  if (rows.length === 0) return;
  await db("document_terms")
    .insert(rows.map((r) => ({ ...r, created_at: db.raw("CURRENT_TIMESTAMP(3)") })))
    .onConflict("document_id")
    .merge(["tokenizer_version", "has_letter", "distinct_terms", "counts", "created_at"]);
}

/** Removes a document's counts (with its text, when it is disposed). */
export async function deleteTerms(trx: Knex.Transaction, documentIds: number[]): Promise<void> {
  if (documentIds.length) await trx("document_terms").whereIn("document_id", documentIds).delete();
}

/** Documents (alias d) with text and no counts of the current tokenizer. */
function needingTerms(db: Knex): Knex.QueryBuilder {
  return db("documents as d")
    .leftJoin("document_terms as t", "t.document_id", "d.id")
    .whereNotNull("d.text")
    .where((w) => w.whereNull("t.document_id").orWhereNot("t.tokenizer_version", TOKENIZER_VERSION));
}

/** Tokenises these documents (those that still have text) and stores their counts now; returns how many. */
export async function tokenizeDocuments(ids: number[]): Promise<number> {
  const rows = await termsRowsFor(ids);
  await storeTermsWithJob(rows, async () => true);
  return rows.length;
}

/**
 * Stores counts computed outside the transaction, for the documents that still have text then
 * (a locking read: a disposal that cleared a text meanwhile wins), with the job's completion.
 */
export async function storeTermsWithJob(rows: TermsRow[], complete: (trx: Knex.Transaction) => Promise<boolean>): Promise<boolean> {
  return getDb().transaction(async (trx) => {
    if (!(await complete(trx))) return false;
    if (rows.length === 0) return true;
    const live = new Set(
      (await trx("documents").whereIn("id", rows.map((r) => r.document_id)).whereNotNull("text").forShare().pluck("id")).map(Number),
    );
    await storeTerms(rows.filter((r) => live.has(r.document_id)), trx);
    return true;
  });
}

/** Loads these documents' texts and tokenises them (outside any transaction). */
export async function termsRowsFor(ids: number[]): Promise<TermsRow[]> {
  if (ids.length === 0) return [];
  const rows: (DocumentTextRow & { id: number })[] = await getDb()("documents")
    .whereIn("id", ids)
    .whereNotNull("text")
    .select("id", "text", "original_name", "media_type", "page_count", "ocr_used");
  return rows.map((r) => termsRowOf(r.id, r));
}

/** Ids of documents whose counts are missing or of another tokenizer version, in id order. */
export async function findDocumentsNeedingTerms(limit: number, afterId = 0, filter?: (q: Knex.QueryBuilder) => Knex.QueryBuilder): Promise<number[]> {
  let q = needingTerms(getDb()).where("d.id", ">", afterId);
  if (filter) q = filter(q);
  return (await q.orderBy("d.id").limit(limit).pluck("d.id")).map(Number);
}

/**
 * Queues "tokenize" jobs (TOKENIZE_BATCH documents each) for every document whose counts are
 * missing or outdated, unless such jobs are already queued or running. Returns the documents queued.
 */
export async function queueRetokenizing(): Promise<number> {
  const queued = await withNamedLock("foldwright_retokenize", 10, async () => {
    const pending = await getDb()("jobs").where({ kind: TOKENIZE_JOB }).whereIn("status", ["queued", "running"]).first("id");
    if (pending) return 0;
    let after = 0;
    let total = 0;
    for (;;) {
      const ids = await findDocumentsNeedingTerms(TOKENIZE_BATCH * 20, after);
      if (ids.length === 0) break;
      for (let i = 0; i < ids.length; i += TOKENIZE_BATCH) await enqueueJob(TOKENIZE_JOB, null, { ids: ids.slice(i, i + TOKENIZE_BATCH) });
      total += ids.length;
      after = ids[ids.length - 1];
    }
    return total;
  });
  return queued ?? 0;
}
