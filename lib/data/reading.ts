import "server-only";
// Stores what the reading job found, in one transaction with the job's completion.
import { getDb } from "@/db";
import { completeJob, enqueueJob } from "@/lib/data/jobs";
import { SUGGEST_JOB } from "@/lib/jobs/kinds";
import { storeTerms, termsRowOf } from "@/lib/data/document-terms";
import type { ReadOutcome, SensitiveCounts } from "@/lib/intake";
import { settleImportedReading } from "@/lib/data/import-settle";

export interface DocumentToRead {
  id: number;
  storage_key: string;
  original_name: string;
  media_type: string;
  status: string;
}

export async function findDocumentToRead(id: number): Promise<DocumentToRead | undefined> {
  return getDb()("documents").where({ id }).first("id", "storage_key", "original_name", "media_type", "status");
}

/**
 * Returns false (and writes nothing) when this worker no longer holds the job; otherwise the
 * import's id when the document came from an archive import (it is filed, not suggested), else
 * null. A read text's term counts (lib/data/document-terms.ts) are computed first and stored with it.
 */
export async function saveReading(
  jobId: number,
  workerId: string,
  doc: Pick<DocumentToRead, "id" | "original_name" | "media_type">,
  outcome: ReadOutcome,
  counts: SensitiveCounts,
): Promise<false | { importId: number | null }> {
  const documentId = doc.id;
  const terms =
    outcome.status === "ready"
      ? termsRowOf(documentId, { text: outcome.text, original_name: doc.original_name, media_type: doc.media_type, page_count: outcome.pageCount, ocr_used: outcome.ocrUsed })
      : null;
  return getDb().transaction(async (trx) => {
    if (!(await completeJob(trx, jobId, workerId))) return false;
    const common = { read_at: trx.fn.now() };
    if (outcome.status === "ready") {
      await trx("documents").where({ id: documentId }).update({
        ...common,
        status: "ready",
        text: outcome.text,
        page_count: outcome.pageCount,
        ocr_used: outcome.ocrUsed,
        ocr_pages: outcome.ocrPages,
        char_count: outcome.charCount,
        read_ms: outcome.readMs,
        ssn_count: counts.ssn,
        routing_count: counts.routing,
        card_count: counts.card,
        unreadable_code: null,
        unreadable_reason: null,
      });
      await storeTerms([terms!], trx);
      const importId = await settleImportedReading(trx, documentId, { ready: true });
      if (importId === null) await enqueueJob(SUGGEST_JOB, documentId, null, trx);
      return { importId };
    } else {
      await trx("documents").where({ id: documentId }).update({
        ...common,
        status: "unreadable",
        unreadable_code: outcome.code,
        unreadable_reason: outcome.reason,
      });
      return { importId: await settleImportedReading(trx, documentId, { ready: false, code: outcome.code, reason: outcome.reason }) };
    }
  });
}

/** After every retry failed: the document is marked unreadable; its original stays. */
export async function markReadingFailed(documentId: number, reason: string): Promise<number | null> {
  return getDb().transaction(async (trx) => {
    await trx("documents").where({ id: documentId, status: "reading" }).update({
      status: "unreadable",
      unreadable_code: "reader_failed",
      unreadable_reason: reason,
      read_at: trx.fn.now(),
    });
    return settleImportedReading(trx, documentId, { ready: false, code: "reader_failed", reason });
  });
}
