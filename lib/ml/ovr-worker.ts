// Worker side of ovr-pool.ts: for each job, trains its share of the classes in lockstep and
// posts each class's weights. The worker stays for the next job until the pool stops it.
import { parentPort } from "node:worker_threads";
import type { CsrMatrix } from "./csr";
import { trainClassesAgainstRest } from "./logistic";
import type { TrainingJob, WorkerMessage } from "./ovr-pool";

/** Trains the job's classes and posts their weights (transferred, not copied). */
function runJob(job: TrainingJob): void {
  const x: CsrMatrix = { rows: job.rows, cols: job.cols, indptr: job.indptr, indices: job.indices, data: job.data };
  const models = trainClassesAgainstRest(x, job.labelIds, job.classIds, job.options);
  models.forEach((m, a) => {
    const msg: WorkerMessage = { type: "result", jobId: job.jobId, classId: job.classIds[a], ...m };
    parentPort!.postMessage(msg, [m.weights.buffer as ArrayBuffer]);
  });
}

parentPort!.on("message", (job: TrainingJob) => {
  try {
    runJob(job);
  } catch (err) {
    const msg: WorkerMessage = { type: "error", jobId: job.jobId, message: err instanceof Error ? err.message : String(err) };
    parentPort!.postMessage(msg);
  }
});
parentPort!.postMessage({ type: "ready" } satisfies WorkerMessage);
