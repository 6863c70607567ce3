// The "tokenize" job: stores the term counts of a batch of documents whose counts are missing or
// were made by another tokenizer version (queued by queueRetokenizing, lib/data/document-terms.ts).
import { completeJob } from "@/lib/data/jobs";
import { storeTermsWithJob, termsRowsFor } from "@/lib/data/document-terms";
import type { JobHandler } from "@/lib/jobs/worker";

export const tokenizeJob: JobHandler = {
  async run(job, workerId) {
    const { ids } = (typeof job.payload === "string" ? JSON.parse(job.payload) : job.payload) as { ids: number[] };
    const rows = await termsRowsFor(ids);
    await storeTermsWithJob(rows, (trx) => completeJob(trx, job.id, workerId));
  },
};
