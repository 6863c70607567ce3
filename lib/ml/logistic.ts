// Binary L2-regularised logistic regression over sparse rows, solved by a trust-region Newton
// method (TRON) with preconditioned conjugate gradients on Hessian-vector products.
//
// Objective (intercept b NOT penalised, as in scikit-learn's lbfgs solver; liblinear penalises it):
//   min over (w, b) of  ½‖w‖² + C Σᵢ kᵢ log(1 + exp(−yᵢ(w·xᵢ + b)))      (kᵢ = class weight)
// It is strictly convex in w and, with both classes present, has one optimum, so any correct
// solver reaches the same point: the tests compare it with scikit-learn's lbfgs.
//
// Stopping rule (liblinear's for this loss): stop when
//   ‖∇f(w, b)‖₂ ≤ tolerance · max(min(#pos, #neg), 1) / #rows · ‖∇f(0, 0)‖₂
// or after maxIterations Newton steps. The class-size factor keeps rare classes from stopping
// early: at zero the intercept's gradient dominates and scales with the row count.
//
// Why our own solver: no well-known npm package does sparse regularised logistic regression.
// `ml-logistic-regression` is dense, fixed-step gradient descent without intercept or
// regularisation, so it stays only as a cross-check on small dense data and as the benchmark's
// baseline.
//
// Sources: C.-J. Lin, R. C. Weng, S. S. Keerthi, "Trust region Newton method for large-scale
// logistic regression", JMLR 9 (2008) — the outer trust-region loop and its radius updates;
// C.-Y. Hsia, W.-L. Chiang, C.-J. Lin, "Preconditioned conjugate gradient methods in truncated
// Newton frameworks for large-scale linear classification", ACML 2018 — the diagonal
// preconditioner mixed with the identity (α = 0.01); the inner CG stops when the quadratic
// model's relative decrease per step is small (the rule in recent liblinear tron.cpp, recalled
// from memory, not copied).
import { multiplyRows, type CsrMatrix } from "./csr";
import { solveAlone, solveTogether, type ProductSolver } from "./lockstep";
import { createLogisticLoss, sigmoid } from "./logistic-loss";
import { computeNorm, minimiseTrustRegion } from "./tron";

export interface LogisticOptions {
  /** Inverse regularisation strength C (> 0). */
  C: number;
  /** Relative gradient-norm tolerance of the stopping rule above. */
  tolerance: number;
  /** Cap on Newton steps. */
  maxIterations: number;
  /** Weigh each side by rows / (2 · rows of that side), like scikit-learn's class_weight="balanced". */
  balanced: boolean;
  /** A weight per row (scikit-learn's sample_weight): cᵢ = C · class weight · rowWeights[i]. */
  rowWeights?: Float64Array;
}

export const DEFAULT_LOGISTIC_OPTIONS: LogisticOptions = { C: 10, tolerance: 1e-3, maxIterations: 200, balanced: false };

export interface BinaryModel {
  weights: Float64Array;
  intercept: number;
  iterations: number;
  converged: boolean;
}

/** Checks the options before fitting. */
export function checkLogisticOptions(o: LogisticOptions): void {
  if (!(o.C > 0 && Number.isFinite(o.C))) throw new Error(`C must be a positive number, got ${o.C}.`);
  if (!(o.tolerance > 0)) throw new Error(`tolerance must be positive, got ${o.tolerance}.`);
  if (!(Number.isInteger(o.maxIterations) && o.maxIterations >= 1)) {
    throw new Error(`maxIterations must be a whole number ≥ 1, got ${o.maxIterations}.`);
  }
  if (o.rowWeights !== undefined && !o.rowWeights.every((w) => w > 0 && Number.isFinite(w))) {
    throw new Error("Every row weight must be a positive number.");
  }
}

/** Checks one binary problem and returns its solver (a generator of sparse products). */
export function createBinarySolver(
  x: CsrMatrix,
  positive: Uint8Array,
  options: LogisticOptions = DEFAULT_LOGISTIC_OPTIONS,
): ProductSolver<BinaryModel> {
  checkLogisticOptions(options);
  if (positive.length !== x.rows) throw new Error("There must be one label per row.");
  if (options.rowWeights !== undefined && options.rowWeights.length !== x.rows) throw new Error("There must be one row weight per row.");
  let pos = 0;
  for (let i = 0; i < positive.length; i++) pos += positive[i];
  const neg = x.rows - pos;
  if (pos === 0 || neg === 0) throw new Error("A binary model needs rows of both sides; this class has only one.");
  return solveBinary(x, positive, pos, options);
}

function* solveBinary(x: CsrMatrix, positive: Uint8Array, pos: number, options: LogisticOptions): ProductSolver<BinaryModel> {
  const neg = x.rows - pos;
  const y = new Float64Array(x.rows);
  const cost = new Float64Array(x.rows);
  const posWeight = options.balanced ? x.rows / (2 * pos) : 1;
  const negWeight = options.balanced ? x.rows / (2 * neg) : 1;
  const rowWeights = options.rowWeights;
  for (let i = 0; i < x.rows; i++) {
    y[i] = positive[i] ? 1 : -1;
    cost[i] = options.C * (positive[i] ? posWeight : negWeight) * (rowWeights === undefined ? 1 : rowWeights[i]);
  }
  const loss = createLogisticLoss({ x, y, cost });
  const n = x.cols;

  const theta = new Float64Array(n + 1);
  const grad = new Float64Array(n + 1);
  yield* loss.evaluate(theta);
  yield* loss.gradient(theta, grad);
  const gradNormAtZero = computeNorm(grad);
  // Start from the best intercept-only model: fewer Newton steps for rare classes.
  theta[n] = Math.log((pos * posWeight) / (neg * negWeight));
  const target = (options.tolerance * Math.max(Math.min(pos, neg), 1)) / x.rows * gradNormAtZero;
  const result = yield* minimiseTrustRegion(loss, theta, target, options.maxIterations);
  return { weights: theta.slice(0, n), intercept: theta[n], iterations: result.iterations, converged: result.converged };
}

/** Fits one binary model: `positive[i]` is 1 when row i belongs to the class. */
export function trainBinaryLogistic(x: CsrMatrix, positive: Uint8Array, options: LogisticOptions = DEFAULT_LOGISTIC_OPTIONS): BinaryModel {
  return solveAlone(x, createBinarySolver(x, positive, options));
}

/**
 * Fits each class in `classIds` against all other classes (one-vs-rest), given each row's class
 * index, in lockstep so that every pass over the matrix serves all of them.
 */
export function trainClassesAgainstRest(x: CsrMatrix, labelIds: Int32Array, classIds: number[], options: LogisticOptions): BinaryModel[] {
  const solvers = classIds.map((k) => {
    const positive = new Uint8Array(labelIds.length);
    for (let i = 0; i < labelIds.length; i++) positive[i] = labelIds[i] === k ? 1 : 0;
    return createBinarySolver(x, positive, options);
  });
  return solveTogether(x, solvers);
}

/** σ(w·xᵢ + b) for every row. */
export function predictBinaryProbabilities(x: CsrMatrix, model: BinaryModel): Float64Array {
  const out = new Float64Array(x.rows);
  multiplyRows(x, model.weights, model.intercept, out);
  for (let i = 0; i < out.length; i++) out[i] = sigmoid(out[i]);
  return out;
}
