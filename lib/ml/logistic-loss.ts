// The binary L2-regularised logistic loss over sparse rows, with an unpenalised intercept:
//   f(w, b) = ½‖w‖² + Σᵢ cᵢ log(1 + exp(−yᵢ zᵢ)),   zᵢ = w·xᵢ + b,  yᵢ ∈ {−1, +1}
// where cᵢ = C · (class weight of yᵢ). The parameters live in one vector θ = (w₀ … wₙ₋₁, b).
//   ∇f   = (w, 0) + Σᵢ cᵢ (σ(yᵢzᵢ) − 1) yᵢ (xᵢ, 1)
//   ∇²f  = diag(1, …, 1, 0) + Σᵢ Dᵢ (xᵢ, 1)(xᵢ, 1)ᵀ,   Dᵢ = cᵢ σ(yᵢzᵢ)(1 − σ(yᵢzᵢ))
// The Hessian is only ever applied to a vector (two passes over the rows), never formed.
// Each method is a generator that yields its sparse products (lockstep.ts serves them), so many
// classes can share one pass over the matrix; the element-wise work stays here.
import type { CsrMatrix } from "./csr";
import type { ProductSolver } from "./lockstep";

export interface BinaryProblem {
  x: CsrMatrix;
  /** +1 for the class, −1 for the rest. */
  y: Float64Array;
  /** cᵢ = C · class weight of row i. */
  cost: Float64Array;
}

export interface LogisticLoss {
  /** f(θ); remembers zᵢ for the gradient at the same θ. */
  evaluate(theta: Float64Array): ProductSolver<number>;
  /** ∇f at the θ last given to evaluate; also fixes the Dᵢ used by the Hessian products. */
  gradient(theta: Float64Array, out: Float64Array): ProductSolver<void>;
  /** out = ∇²f · v at the θ of the last gradient call. */
  multiplyHessian(v: Float64Array, out: Float64Array): ProductSolver<void>;
  /** Diagonal of ∇²f (for the preconditioner). */
  diagonalHessian(out: Float64Array): ProductSolver<void>;
}

/** Numerically safe log(1 + exp(−t)). */
export function logOnePlusExpNeg(t: number): number {
  return t >= 0 ? Math.log1p(Math.exp(-t)) : -t + Math.log1p(Math.exp(t));
}

/** Numerically safe logistic function σ(t) = 1 / (1 + exp(−t)). */
export function sigmoid(t: number): number {
  if (t >= 0) return 1 / (1 + Math.exp(-t));
  const e = Math.exp(t);
  return e / (1 + e);
}

// Element-wise loops sit in plain functions outside the generators below, which V8 optimises
// better.

/** Σᵢ cᵢ log(1 + exp(−yᵢzᵢ)) + ½‖w‖². */
function sumLoss(theta: Float64Array, n: number, y: Float64Array, z: Float64Array, cost: Float64Array): number {
  let f = 0;
  for (let j = 0; j < n; j++) f += theta[j] * theta[j];
  f *= 0.5;
  for (let i = 0; i < z.length; i++) f += cost[i] * logOnePlusExpNeg(y[i] * z[i]);
  return f;
}

/** Dᵢ and uᵢ = cᵢ(σ(yᵢzᵢ) − 1)yᵢ at the current zᵢ; returns Σuᵢ (the intercept's gradient). */
function weighRows(y: Float64Array, z: Float64Array, cost: Float64Array, d: Float64Array, u: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < z.length; i++) {
    const s = sigmoid(y[i] * z[i]);
    d[i] = cost[i] * s * (1 - s);
    u[i] = cost[i] * (s - 1) * y[i];
    sum += u[i];
  }
  return sum;
}

/** u ∘= d; returns Σuᵢ. */
function scaleRows(u: Float64Array, d: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < u.length; i++) {
    u[i] *= d[i];
    sum += u[i];
  }
  return sum;
}

/** Σ d. */
function sumOf(d: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < d.length; i++) sum += d[i];
  return sum;
}

/** Creates the loss for one binary problem; scratch arrays are allocated once here. */
export function createLogisticLoss(problem: BinaryProblem): LogisticLoss {
  const { x, y, cost } = problem;
  const n = x.cols;
  const z = new Float64Array(x.rows);
  const d = new Float64Array(x.rows);
  const u = new Float64Array(x.rows);

  return {
    *evaluate(theta) {
      yield { kind: "rows", input: theta, out: z };
      return sumLoss(theta, n, y, z, cost);
    },
    *gradient(theta, out) {
      const biasGrad = weighRows(y, z, cost, d, u);
      out.set(theta.subarray(0, n));
      yield { kind: "columns", input: u, out };
      out[n] = biasGrad;
    },
    *multiplyHessian(v, out) {
      yield { kind: "rows", input: v, out: u };
      const biasOut = scaleRows(u, d);
      out.set(v.subarray(0, n));
      yield { kind: "columns", input: u, out };
      out[n] = biasOut;
    },
    *diagonalHessian(out) {
      out.fill(1, 0, n);
      const bias = sumOf(d);
      yield { kind: "squares", input: d, out };
      out[n] = bias;
    },
  };
}
