// The "suggest" job: rank the cabinet types and matters of a document that has been read.
import { findDocumentForSuggestion, saveSuggestion } from "@/lib/data/suggestions";
import { computeSuggestion } from "@/lib/learning/suggest";
import type { JobHandler } from "@/lib/jobs/worker";

export const suggestJob: JobHandler = {
  async run(job, workerId) {
    const doc = await findDocumentForSuggestion(job.document_id!);
    if (!doc) throw new Error(`document ${job.document_id} is gone`);
    const suggestion = await computeSuggestion(doc);
    // A document filed by hand in the meantime keeps its filing; the suggestion is still recorded.
    if (doc.filed_at) suggestion.autoFile = false;
    await saveSuggestion(job.id, workerId, suggestion);
  },
};
