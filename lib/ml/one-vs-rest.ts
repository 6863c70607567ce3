// One-vs-rest wrapper (DESIGN.md §5): one binary logistic model per class, class k against all
// others. The classes of a thread are trained in lockstep (lockstep.ts), so each pass over the
// matrix serves all of them; with more than one thread the classes are dealt round-robin to
// worker threads that share the matrix through SharedArrayBuffers. `threads: 1` (or workers
// failing to start, as inside a bundler that cannot load the worker file) trains in this thread
// with the same code and gets bit-identical weights.
import { availableParallelism } from "node:os";
import { assertFiniteCsr, type CsrMatrix } from "./csr";
import { checkLogisticOptions, trainClassesAgainstRest, type LogisticOptions } from "./logistic";
import { runClassWorkers, startTrainingWorkers, type ClassResult } from "./ovr-pool";

export interface OneVsRestOptions extends LogisticOptions {
  /** Worker threads; 1 trains in the calling thread without workers. */
  threads: number;
}

export interface OneVsRestModel {
  /** Weights of class k are row k: weights[k·cols … (k+1)·cols). */
  weights: Float64Array;
  intercepts: Float64Array;
  cols: number;
  /** Newton steps per class (one binary model per class). */
  iterations: Int32Array;
  converged: boolean;
  /** Threads that actually trained (1 when workers were unavailable). */
  threadsUsed: number;
}

/** Default thread count: the cores there are (at most 8: more rarely pays on office-sized data). */
export function chooseThreads(): number {
  return Math.max(1, Math.min(availableParallelism(), 8));
}

/**
 * Starts the training workers ahead of a fit (trainModel calls it before vectorising, so their
 * start-up overlaps that work). A failure here is met again, and handled, when the fit asks for
 * the workers: it then trains in this thread.
 */
export function warmUpWorkers(threads: number): void {
  if (threads > 1) startTrainingWorkers(threads).catch(() => undefined);
}

/** Checks labels: one per row, ids in range, at least two classes, each class present. */
function checkLabels(x: CsrMatrix, labelIds: Int32Array, classCount: number): void {
  if (labelIds.length !== x.rows) throw new Error(`There are ${x.rows} rows but ${labelIds.length} labels.`);
  if (x.rows === 0) throw new Error("Cannot train on zero documents.");
  if (classCount < 2) throw new Error("Training needs at least two different labels; only one was given.");
  const seen = new Uint8Array(classCount);
  for (const id of labelIds) {
    if (!(id >= 0 && id < classCount)) throw new Error(`Label id ${id} is outside 0..${classCount - 1}.`);
    seen[id] = 1;
  }
  const missing = seen.indexOf(0);
  if (missing >= 0) throw new Error(`Class ${missing} has no rows; drop it or add documents.`);
}

/** Fits the binary models of the given classes in this thread. */
function trainClasses(x: CsrMatrix, labelIds: Int32Array, classIds: number[], options: LogisticOptions): ClassResult[] {
  return trainClassesAgainstRest(x, labelIds, classIds, options).map((m, a) => ({ classId: classIds[a], ...m }));
}

/** Trains all classes; x rows are documents, labelIds[i] the class index of row i. */
export async function trainOneVsRest(
  x: CsrMatrix,
  labelIds: Int32Array,
  classCount: number,
  options: OneVsRestOptions,
): Promise<OneVsRestModel> {
  checkLogisticOptions(options);
  checkLabels(x, labelIds, classCount);
  assertFiniteCsr(x);
  const threads = Math.max(1, Math.min(Math.floor(options.threads), classCount));
  let results: ClassResult[] | null = null;
  let threadsUsed = 1;
  if (threads > 1) {
    results = await runClassWorkers(x, labelIds, classCount, options, threads).catch(() => null);
    if (results !== null) threadsUsed = threads;
  }
  if (results === null) {
    results = trainClasses(x, labelIds, Array.from({ length: classCount }, (_, k) => k), options);
  }
  return collectModel(results, x.cols, classCount, threadsUsed);
}

/** Packs per-class results into one row-major weight block. */
function collectModel(results: ClassResult[], cols: number, classCount: number, threadsUsed: number): OneVsRestModel {
  const weights = new Float64Array(classCount * cols);
  const intercepts = new Float64Array(classCount);
  const iterations = new Int32Array(classCount);
  let converged = true;
  for (const r of results) {
    weights.set(r.weights, r.classId * cols);
    intercepts[r.classId] = r.intercept;
    iterations[r.classId] = r.iterations;
    converged &&= r.converged;
  }
  if (results.length !== classCount) throw new Error("Training lost a class; this is a bug.");
  return { weights, intercepts, cols, iterations, converged, threadsUsed };
}
