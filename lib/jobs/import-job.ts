// The "import" job: stores the files of a confirmed archive import (lib/data/import-run.ts), then
// finishes the import when nothing is left to read (files already read, or none stored at all).
import { runImport } from "@/lib/data/import-run";
import { finishImport } from "@/lib/jobs/import-finish";
import type { JobHandler } from "@/lib/jobs/worker";
import { failImport } from "@/lib/data/import-settle";

const importIdOf = (payload: unknown) => ((typeof payload === "string" ? JSON.parse(payload) : payload) as { importId: number }).importId;

export const importJob: JobHandler = {
  async run(job, workerId) {
    const importId = importIdOf(job.payload);
    if (await runImport(job.id, workerId, importId)) await finishImport(importId);
  },
  async giveUp(job, error) {
    await failImport(importIdOf(job.payload), `The import stopped after several tries: ${error}`);
  },
};
