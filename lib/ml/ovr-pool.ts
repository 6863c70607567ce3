// Runs one-vs-rest classes on worker threads. The matrix and labels are copied once into
// SharedArrayBuffers; the classes are dealt round-robin, one share per worker, and each worker
// trains its share in lockstep and sends the weights back. (A shared queue of single classes
// would balance better but would lose the lockstep passes, which matter more.)
// The worker starts from a plain .mjs entry that loads the TypeScript worker through tsx's API:
// Node.js 20 does not pass the parent's loader hooks to workers, and this way the same file works
// under the tsx CLI, vitest and plain node. Any failure rejects, and the caller then trains in
// its own thread.
import { Worker } from "node:worker_threads";
import type { CsrMatrix } from "./csr";
import type { LogisticOptions } from "./logistic";

export interface ClassResult {
  classId: number;
  weights: Float64Array;
  intercept: number;
  iterations: number;
  converged: boolean;
}

export interface SharedProblem {
  rows: number;
  cols: number;
  indptr: Int32Array;
  indices: Int32Array;
  data: Float64Array;
  labelIds: Int32Array;
  options: LogisticOptions;
}

type WorkerMessage = { type: "ready" } | ({ type: "result" } & ClassResult) | { type: "error"; message: string };

/** Copies a typed array into shared memory so workers read it without a copy each. */
function shareArray<T extends Int32Array | Float64Array>(a: T): T {
  const buffer = new SharedArrayBuffer(a.byteLength);
  const out = (a instanceof Int32Array ? new Int32Array(buffer) : new Float64Array(buffer)) as T;
  out.set(a);
  return out;
}

/** Trains every class on `threads` workers; resolves with the results in any order. */
export function runClassWorkers(
  x: CsrMatrix,
  labelIds: Int32Array,
  classCount: number,
  options: LogisticOptions,
  threads: number,
): Promise<ClassResult[]> {
  const shared: SharedProblem = {
    rows: x.rows,
    cols: x.cols,
    indptr: shareArray(x.indptr),
    indices: shareArray(x.indices),
    data: shareArray(x.data),
    labelIds: shareArray(labelIds),
    options: { ...options },
  };
  return new Promise((resolve, reject) => {
    const results: ClassResult[] = [];
    const workers: Worker[] = [];
    let failed = false;
    const fail = (err: unknown) => {
      if (failed) return;
      failed = true;
      for (const w of workers) void w.terminate();
      reject(err instanceof Error ? err : new Error(String(err)));
    };
    const url = new URL("./ovr-worker-entry.mjs", import.meta.url);
    for (let t = 0; t < threads; t++) {
      const share = Array.from({ length: classCount }, (_, k) => k).filter((k) => k % threads === t);
      let worker: Worker;
      try {
        // execArgv []: the worker need not repeat the parent's loader flags (tsx's would start a
        // second loader); the entry file registers what it needs.
        worker = new Worker(url, { workerData: shared, execArgv: [] });
      } catch (err) {
        fail(err);
        return;
      }
      workers.push(worker);
      worker.on("message", (msg: WorkerMessage) => {
        if (failed) return;
        if (msg.type === "error") return fail(new Error(msg.message));
        if (msg.type === "ready") {
          worker.postMessage({ classIds: share });
          return;
        }
        results.push(msg);
        if (results.length === classCount) {
          for (const w of workers) void w.terminate();
          resolve(results);
        }
      });
      worker.on("error", fail);
      worker.on("exit", (code) => {
        if (results.length < classCount && code !== 0) fail(new Error(`A training worker stopped with code ${code}.`));
      });
    }
  });
}
