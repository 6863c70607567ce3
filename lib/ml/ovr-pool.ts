// Runs one-vs-rest classes on worker threads. The classes are dealt round-robin, one share per
// worker, and each worker trains its share in lockstep and sends the weights back. (A shared
// queue of single classes would balance better but would lose the lockstep passes, which matter
// more.) The matrix and labels go to the workers as SharedArrayBuffers, so nothing is copied.
//
// The workers are started once and kept between trainings (cross-validation trains five times),
// and trainModel starts them while it vectorises: loading the TypeScript worker through tsx
// takes a worker about 0.2–0.3 s, a tenth of a CUAD fit. Idle workers are unref'd, so they never
// keep a process alive, and are stopped after IDLE_MS without work.
// The worker starts from a plain .mjs entry that loads the TypeScript worker through tsx's API:
// Node.js 20 does not pass the parent's loader hooks to workers, and this way the same file works
// under the tsx CLI, vitest and plain node. Any failure rejects and stops the pool; the caller
// then trains in its own thread.
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

export interface TrainingJob {
  jobId: number;
  rows: number;
  cols: number;
  indptr: Int32Array;
  indices: Int32Array;
  data: Float64Array;
  labelIds: Int32Array;
  classIds: number[];
  options: LogisticOptions;
}

export type WorkerMessage =
  | { type: "ready" }
  | ({ type: "result"; jobId: number } & ClassResult)
  | { type: "error"; jobId: number; message: string };

const IDLE_MS = 30_000;

interface Pool {
  workers: Worker[];
  ready: Promise<void>;
  running: number;
  idleTimer: NodeJS.Timeout | null;
}

let pool: Pool | null = null;
let nextJobId = 1;

/** Stops every worker of the pool (after a failure, or when idle). */
function stopPool(): void {
  if (pool === null) return;
  if (pool.idleTimer !== null) clearTimeout(pool.idleTimer);
  for (const w of pool.workers) void w.terminate();
  pool = null;
}

/** Starts one worker; resolves when it has loaded the trainer. */
function startWorker(): { worker: Worker; ready: Promise<void> } {
  // execArgv []: the worker need not repeat the parent's loader flags (tsx's would start a
  // second loader); the entry file registers what it needs.
  const worker = new Worker(new URL("./ovr-worker-entry.mjs", import.meta.url), { execArgv: [] });
  worker.unref();
  // An error outside a job (a job has its own listeners) stops the pool; the next job starts anew.
  worker.on("error", () => {
    if (pool?.workers.includes(worker)) stopPool();
  });
  const ready = new Promise<void>((resolve, reject) => {
    worker.once("message", (msg: WorkerMessage) => (msg.type === "ready" ? resolve() : reject(new Error("A training worker did not start."))));
    worker.once("error", reject);
    worker.once("exit", (code) => reject(new Error(`A training worker stopped with code ${code} while starting.`)));
  });
  return { worker, ready };
}

/** Starts (or tops up) the pool to `threads` workers; resolves when all are ready. */
export function startTrainingWorkers(threads: number): Promise<void> {
  pool ??= { workers: [], ready: Promise.resolve(), running: 0, idleTimer: null };
  const current = pool;
  const started: Array<Promise<void>> = [];
  while (current.workers.length < threads) {
    const { worker, ready } = startWorker();
    current.workers.push(worker);
    started.push(ready);
  }
  current.ready = Promise.all([current.ready, ...started]).then(() => undefined);
  current.ready.catch(() => {
    if (pool === current) stopPool();
  });
  return current.ready;
}

/** Copies a typed array into shared memory so workers read it without a copy each. */
function shareArray<T extends Int32Array | Float64Array>(a: T): T {
  if (a.buffer instanceof SharedArrayBuffer) return a;
  const buffer = new SharedArrayBuffer(a.byteLength);
  const out = (a instanceof Int32Array ? new Int32Array(buffer) : new Float64Array(buffer)) as T;
  out.set(a);
  return out;
}

/** Trains every class on `threads` workers; resolves with the results in any order. */
export async function runClassWorkers(
  x: CsrMatrix,
  labelIds: Int32Array,
  classCount: number,
  options: LogisticOptions,
  threads: number,
): Promise<ClassResult[]> {
  await startTrainingWorkers(threads);
  const current = pool!;
  if (current.idleTimer !== null) clearTimeout(current.idleTimer);
  current.running++;
  const workers = current.workers.slice(0, threads);
  for (const w of workers) w.ref();
  const jobId = nextJobId++;
  const base = {
    rows: x.rows,
    cols: x.cols,
    indptr: shareArray(x.indptr),
    indices: shareArray(x.indices),
    data: shareArray(x.data),
    labelIds: shareArray(labelIds),
    options: { ...options },
  };
  try {
    return await new Promise<ClassResult[]>((resolve, reject) => {
      const results: ClassResult[] = [];
      const cleanup = () => {
        for (const w of workers) {
          w.off("message", onMessage);
          w.off("error", onFailure);
          w.off("exit", onExit);
        }
      };
      const onFailure = (err: unknown) => {
        cleanup();
        if (pool === current) stopPool();
        reject(err instanceof Error ? err : new Error(String(err)));
      };
      const onExit = (code: number) => onFailure(new Error(`A training worker stopped with code ${code}.`));
      const onMessage = (msg: WorkerMessage) => {
        if (msg.type === "ready" || msg.jobId !== jobId) return;
        if (msg.type === "error") return onFailure(new Error(msg.message));
        results.push(msg);
        if (results.length === classCount) {
          cleanup();
          resolve(results);
        }
      };
      workers.forEach((w, t) => {
        w.on("message", onMessage);
        w.on("error", onFailure);
        w.on("exit", onExit);
        const classIds = Array.from({ length: classCount }, (_, k) => k).filter((k) => k % threads === t);
        const job: TrainingJob = { jobId, ...base, classIds };
        w.postMessage(job);
      });
    });
  } finally {
    current.running--;
    if (pool === current && current.running === 0) {
      for (const w of current.workers) w.unref();
      current.idleTimer = setTimeout(stopPool, IDLE_MS);
      current.idleTimer.unref();
    }
  }
}
