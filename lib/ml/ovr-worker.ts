// Worker side of ovr-pool.ts: trains the classes the main thread hands out, one at a time.
import { parentPort, workerData } from "node:worker_threads";
import type { CsrMatrix } from "./csr";
import { trainClassAgainstRest } from "./logistic";
import type { SharedProblem } from "./ovr-pool";

const problem = workerData as SharedProblem;
const x: CsrMatrix = {
  rows: problem.rows,
  cols: problem.cols,
  indptr: problem.indptr,
  indices: problem.indices,
  data: problem.data,
};

/** Trains class k against the rest and posts the weights (transferred, not copied). */
function trainAndPost(k: number): void {
  const m = trainClassAgainstRest(x, problem.labelIds, k, problem.options);
  parentPort!.postMessage(
    { type: "result", classId: k, weights: m.weights, intercept: m.intercept, iterations: m.iterations, converged: m.converged },
    [m.weights.buffer as ArrayBuffer],
  );
}

parentPort!.on("message", (msg: { classId: number }) => {
  if (msg.classId < 0) {
    parentPort!.close();
    return;
  }
  try {
    trainAndPost(msg.classId);
  } catch (err) {
    parentPort!.postMessage({ type: "error", message: err instanceof Error ? err.message : String(err) });
  }
});
parentPort!.postMessage({ type: "ready" });
