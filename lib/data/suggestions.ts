import "server-only";
// Storing a suggestion, its "suggested" record, and an auto-filing when the office allows it.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { completeJob, enqueueJob } from "@/lib/data/jobs";
import { appendFilingEvent, linkDocumentToMatters } from "@/lib/data/record";
import type { NewSuggestion } from "@/lib/filing/suggestion";
import { TOKENIZER_VERSION } from "@/lib/ml";

export interface DocumentForSuggestion {
  id: number;
  text: string | null;
  original_name: string;
  media_type: string;
  page_count: number | null;
  ocr_used: number;
  status: string;
  filed_at: Date | null;
  /** Stored term counts of the current tokenizer (JSON, lib/data/document-terms.ts), when there are. */
  term_counts: string | null;
}

export async function findDocumentForSuggestion(id: number): Promise<DocumentForSuggestion | undefined> {
  return getDb()("documents as d")
    .leftJoin("document_terms as t", (j) => j.on("t.document_id", "d.id").andOnVal("t.tokenizer_version", TOKENIZER_VERSION))
    .where("d.id", id)
    .first("d.id", "d.text", "d.original_name", "d.media_type", "d.page_count", "d.ocr_used", "d.status", "d.filed_at", "t.counts as term_counts");
}

async function insertSuggestion(trx: Knex.Transaction, s: NewSuggestion): Promise<void> {
  const top = s.ranked[0];
  await trx("suggestions").insert({
    document_id: s.documentId,
    model_version_id: s.modelVersionId,
    method: s.method,
    ranked: JSON.stringify(s.ranked),
    top_cabinet_type_id: top?.cabinetTypeId ?? null,
    top_confidence: top?.confidence ?? null,
    model_confidence: s.modelConfidence,
    no_confident_match: s.noConfidentMatch,
    why: JSON.stringify(s.why),
    matter_candidates: JSON.stringify(s.matterCandidates),
    top_matter_id: s.topMatterId,
    matter_ambiguous: s.matterAmbiguous,
  });
  // Every matter the suggestion names is linked first: the wall holds before anyone can look.
  await linkDocumentToMatters(trx, s.documentId, s.matterCandidates.map((c) => ({ matterId: c.matterId, how: "candidate" as const })));
  await appendFilingEvent(trx, {
    documentId: s.documentId,
    userId: null,
    action: "suggested",
    toCabinetTypeId: top?.cabinetTypeId ?? null,
    toMatterId: s.topMatterId,
    modelVersionId: s.modelVersionId,
    confidence: top?.confidence ?? null,
    reason: s.method === "model" ? "Suggested by the model." : s.method === "blended" ? "Suggested by the model; some cabinet types ranked by their descriptions (too few examples yet)." : "Ranked by the cabinet types' descriptions and keywords: no model yet.",
  });
  if (s.autoFile && top && s.topMatterId) {
    const n = await trx("documents").where({ id: s.documentId }).whereNull("filed_at").update({
      cabinet_type_id: top.cabinetTypeId,
      matter_id: s.topMatterId,
      filed_at: trx.fn.now(),
      filed_how: "auto",
      filed_by: null,
    });
    if (n === 1) {
      await appendFilingEvent(trx, {
        documentId: s.documentId,
        userId: null,
        action: "auto_filed",
        toCabinetTypeId: top.cabinetTypeId,
        toMatterId: s.topMatterId,
        modelVersionId: s.modelVersionId,
        confidence: top.confidence,
        reason: "Confidence passed the office's auto-file bar; waiting in the spot-check list.",
      });
    }
  }
}

/** Saves the suggestion with the job's completion; nothing is written if the job is no longer ours. */
export async function saveSuggestion(jobId: number | null, workerId: string | null, s: NewSuggestion): Promise<boolean> {
  return getDb().transaction(async (trx) => {
    if (jobId !== null && !(await completeJob(trx, jobId, workerId!))) return false;
    await insertSuggestion(trx, s);
    return true;
  });
}

/** Queues a suggestion for every read, unfiled document that has none and none on the way. */
export async function queueMissingSuggestions(): Promise<number> {
  const db = getDb();
  const ids: number[] = await db("documents as d")
    .where("d.status", "ready")
    .whereNull("d.filed_at")
    .whereNotExists((q) => q.select(db.raw("1")).from("suggestions as s").whereRaw("s.document_id = d.id"))
    .whereNotExists((q) => q.select(db.raw("1")).from("jobs as j").whereRaw("j.document_id = d.id").where("j.kind", "suggest").whereIn("j.status", ["queued", "running"]))
    .pluck("d.id");
  for (const id of ids) await enqueueJob("suggest", id);
  return ids.length;
}
