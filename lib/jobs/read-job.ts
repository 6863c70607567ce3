// The "read" job: fetch the original from the bucket, read its text (OCR when needed), count
// sensitive identifiers, and store the result with the job's completion.
import { countSensitive, readDocument } from "@/lib/intake";
import { env } from "@/lib/env";
import { findDocumentToRead, markReadingFailed, saveReading } from "@/lib/data/reading";
import { getObjectBytes } from "@/storage/s3";
import type { JobHandler } from "@/lib/jobs/worker";
import { finishImport } from "@/lib/jobs/import-finish";

export { READ_JOB } from "@/lib/jobs/kinds";

export const readJob: JobHandler = {
  async run(job, workerId) {
    const doc = await findDocumentToRead(job.document_id!);
    if (!doc) throw new Error(`document ${job.document_id} is gone`);
    const bytes = await getObjectBytes(doc.storage_key); // storage down → throws → retried later
    const outcome = await readDocument(bytes, doc.media_type, { timeLimitMs: env.read.timeLimitMs, pageTimeLimitMs: env.read.pageTimeLimitMs, maxPages: env.read.maxPages });
    const counts = outcome.status === "ready" ? countSensitive(outcome.text) : { ssn: 0, routing: 0, card: 0 };
    const saved = await saveReading(job.id, workerId, doc, outcome, counts);
    // The reading is saved; an import left unfinished here is finished by its next file or by the import job.
    if (saved && saved.importId !== null) await finishImport(saved.importId).catch((e) => console.error(`import ${saved.importId}: finishing failed:`, e));
  },
  async giveUp(job) {
    if (job.document_id) {
      const importId = await markReadingFailed(
        job.document_id,
        "Foldwright could not read this file after several tries. The original is kept: open it to check it, or file it by hand.",
      );
      if (importId !== null) await finishImport(importId);
    }
  },
};
