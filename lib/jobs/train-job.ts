// The "train" job: runs one model version's training (see lib/learning/retrain.ts).
import { completeJob } from "@/lib/data/jobs";
import { updateModelVersion } from "@/lib/data/models";
import { runTraining } from "@/lib/learning/retrain";
import type { JobHandler } from "@/lib/jobs/worker";

export const trainJob: JobHandler = {
  async run(job, workerId) {
    const { versionId } = (typeof job.payload === "string" ? JSON.parse(job.payload) : job.payload) as { versionId: number };
    // The results and the job's completion are written in one transaction (see finishTrainingRun).
    const ran = await runTraining(versionId, {}, (trx) => completeJob(trx, job.id, workerId));
    if (!ran) throw new Error("Another server is training now; this run waits its turn.");
  },
  async giveUp(job, error) {
    const { versionId } = (typeof job.payload === "string" ? JSON.parse(job.payload) : job.payload) as { versionId: number };
    await updateModelVersion(versionId, { status: "failed", progress: null, finished_at: new Date(), reason: `Training could not run: ${error}`.slice(0, 600) });
  },
};
