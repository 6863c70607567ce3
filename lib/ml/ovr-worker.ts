// Worker side of ovr-pool.ts: trains its share of the classes in lockstep, posts each class's
// weights, then closes.
import { parentPort, workerData } from "node:worker_threads";
import type { CsrMatrix } from "./csr";
import { trainClassesAgainstRest } from "./logistic";
import type { SharedProblem } from "./ovr-pool";

const problem = workerData as SharedProblem;
const x: CsrMatrix = {
  rows: problem.rows,
  cols: problem.cols,
  indptr: problem.indptr,
  indices: problem.indices,
  data: problem.data,
};

/** Trains the classes and posts their weights (transferred, not copied). */
function trainAndPost(classIds: number[]): void {
  const models = trainClassesAgainstRest(x, problem.labelIds, classIds, problem.options);
  models.forEach((m, a) => {
    parentPort!.postMessage(
      { type: "result", classId: classIds[a], weights: m.weights, intercept: m.intercept, iterations: m.iterations, converged: m.converged },
      [m.weights.buffer as ArrayBuffer],
    );
  });
}

parentPort!.once("message", (msg: { classIds: number[] }) => {
  try {
    trainAndPost(msg.classIds);
  } catch (err) {
    parentPort!.postMessage({ type: "error", message: err instanceof Error ? err.message : String(err) });
  }
  parentPort!.close();
});
parentPort!.postMessage({ type: "ready" });
