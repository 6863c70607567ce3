import "server-only";
// The training labels: human-confirmed filings only (accepted, refiled, filed by hand, imported
// from the office's own filed folders by an admin, and auto-filed documents once a person
// confirmed them). Labels are cabinet type ids as strings.
//
// The set is read from the stored term counts (document_terms, lib/data/document-terms.ts),
// streamed TRAINING_BATCH rows at a time into one CountMatrix: the texts are neither loaded nor
// tokenised, so memory grows with the vocabulary and the training matrix, not with the texts.
// Filed documents whose counts are missing or outdated (a new tokenizer whose background jobs
// have not finished yet) are tokenised here first, once, and stored.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { CountMatrixBuilder, decodeTermCounts, TOKENIZER_VERSION, type CountMatrix } from "@/lib/ml";
import type { TypePrior } from "@/lib/ml/model-features";
import { findDocumentsNeedingTerms, tokenizeDocuments, TOKENIZE_BATCH } from "@/lib/data/document-terms";

/** Rows per streamed batch. */
export const TRAINING_BATCH = 2_000;

/** Keeps filed documents (table `documents`, alias-free) that a person decided: the training labels. */
export function whereHumanFiled(q: Knex.QueryBuilder): Knex.QueryBuilder {
  return q
    .whereNotNull("filed_at")
    .whereNotNull("cabinet_type_id")
    .where((w) => w.whereIn("filed_how", ["accepted", "refiled", "by_hand", "imported"]).orWhere((a) => a.where("filed_how", "auto").whereNotNull("confirmed_at")));
}

export interface TrainingCounts {
  matrix: CountMatrix;
  /** Cabinet type id (as a string) of each matrix row. */
  labels: string[];
  documentIds: number[];
  /** Documents that had to be tokenised during this load (0 once the background jobs caught up). */
  tokenizedNow: number;
}

/** Streams the human-filed documents' stored counts into a CountMatrix, in id order. */
export async function loadTrainingCounts(batchSize = TRAINING_BATCH): Promise<TrainingCounts> {
  const db = getDb();
  let tokenizedNow = 0;
  for (let after = 0; ; ) {
    const ids = await findDocumentsNeedingTerms(TOKENIZE_BATCH, after, (q) => whereHumanFiled(q));
    if (ids.length === 0) break;
    tokenizedNow += await tokenizeDocuments(ids);
    after = ids[ids.length - 1];
  }
  const builder = new CountMatrixBuilder();
  const labels: string[] = [];
  const documentIds: number[] = [];
  for (let after = 0; ; ) {
    const rows: { id: number; cabinet_type_id: number; counts: string }[] = await whereHumanFiled(db("documents"))
      .join("document_terms as t", "t.document_id", "documents.id")
      .where("t.tokenizer_version", TOKENIZER_VERSION)
      .where("t.has_letter", true)
      .whereNotNull("documents.text")
      .where("documents.id", ">", after)
      .orderBy("documents.id")
      .limit(batchSize)
      .select("documents.id", "documents.cabinet_type_id", "t.counts");
    if (rows.length === 0) break;
    for (const r of rows) {
      builder.add(decodeTermCounts(r.counts));
      labels.push(String(r.cabinet_type_id));
      documentIds.push(r.id);
    }
    after = rows[rows.length - 1].id;
  }
  return { matrix: builder.build(), labels, documentIds, tokenizedNow };
}

/** Every cabinet type's name, description and keywords, labelled as the training set is (by id). */
export async function loadTypePriors(): Promise<TypePrior[]> {
  const rows: { id: number; name: string; description: string | null; keywords: string | string[] | null }[] = await getDb()("cabinet_types")
    .select("id", "name", "description", "keywords")
    .orderBy("id");
  return rows.map((r) => {
    let keywords: string[] = [];
    try {
      const parsed: unknown = typeof r.keywords === "string" ? JSON.parse(r.keywords) : r.keywords;
      if (Array.isArray(parsed)) keywords = parsed.filter((k): k is string => typeof k === "string");
    } catch {
      keywords = [];
    }
    return { label: String(r.id), name: r.name, description: r.description ?? "", keywords };
  });
}
