// Trust-region Newton minimisation (TRON) of a smooth convex function given its value, gradient,
// Hessian-vector products and Hessian diagonal. Each step approximately solves
//   min ½ sᵀHs + gᵀs  subject to  ‖s‖_M ≤ Δ
// by preconditioned conjugate gradients (M = (1 − α)I + α·diag(H), α = 0.01), then accepts the
// step when the actual decrease is a fair share of the predicted one and resizes Δ.
// Stopping rule: ‖∇f‖₂ ≤ target (chosen by the caller), or maxIterations accepted steps, or no
// further progress representable in floating point.
// Sources: Lin, Weng & Keerthi, JMLR 9 (2008), Algorithm 2 and the radius rules of §2.2;
// Hsia, Chiang & Lin, ACML 2018, for the preconditioner; the inner stopping rule on the quadratic
// model's decrease follows recent liblinear releases (recalled from memory).
// It is a generator: every sparse product is yielded (see lockstep.ts), so one pass over the
// matrix can serve the solvers of many classes at once.
import type { ProductSolver } from "./lockstep";
import type { LogisticLoss } from "./logistic-loss";

const ETA0 = 1e-4;
const ETA1 = 0.25;
const ETA2 = 0.75;
const SIGMA1 = 0.25;
const SIGMA2 = 0.5;
const SIGMA3 = 4;
const PRECONDITIONER_MIX = 0.01;
const CG_DECREASE_RATIO = 0.5;

export interface TrustRegionResult {
  iterations: number;
  converged: boolean;
}

/** Euclidean norm without spreading a large array into arguments. */
export function computeNorm(v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += v[i] * v[i];
  return Math.sqrt(s);
}

/** uᵀ diag(m) v. */
function dotScaled(u: Float64Array, m: Float64Array, v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < u.length; i++) s += u[i] * m[i] * v[i];
  return s;
}

function dot(u: Float64Array, v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < u.length; i++) s += u[i] * v[i];
  return s;
}

interface CgScratch {
  s: Float64Array;
  r: Float64Array;
  z: Float64Array;
  d: Float64Array;
  hd: Float64Array;
}

// The dense loops live in plain functions, outside the generators: V8 optimised them there and
// the whole fit ran faster (generator bodies with yields compile less well).

/** s = 0, r = −g, z = d = M⁻¹r; returns zᵀr. */
function startCg(g: Float64Array, inv: Float64Array, w: CgScratch): number {
  const { s, r, z, d } = w;
  let zr = 0;
  for (let i = 0; i < g.length; i++) {
    s[i] = 0;
    r[i] = -g[i];
    z[i] = r[i] * inv[i];
    d[i] = z[i];
    zr += z[i] * r[i];
  }
  return zr;
}

/** s += αd; returns sᵀMs. */
function stepAlong(w: CgScratch, m: Float64Array, alpha: number): number {
  const { s, d } = w;
  let sMs = 0;
  for (let i = 0; i < s.length; i++) {
    const si = s[i] + alpha * d[i];
    s[i] = si;
    sMs += si * m[i] * si;
  }
  return sMs;
}

/** r −= α·Hd, z = M⁻¹r; writes zᵀr, gᵀs and rᵀs into sums[0..2]. */
function updateResidual(w: CgScratch, g: Float64Array, inv: Float64Array, alpha: number, sums: Float64Array): void {
  const { s, r, z, hd } = w;
  let zr = 0;
  let gs = 0;
  let rs = 0;
  for (let i = 0; i < r.length; i++) {
    const ri = r[i] - alpha * hd[i];
    r[i] = ri;
    const zi = ri * inv[i];
    z[i] = zi;
    zr += zi * ri;
    gs += g[i] * s[i];
    rs += ri * s[i];
  }
  sums[0] = zr;
  sums[1] = gs;
  sums[2] = rs;
}

/** d = z + βd. */
function updateDirection(w: CgScratch, beta: number): void {
  const { z, d } = w;
  for (let i = 0; i < d.length; i++) d[i] = z[i] + beta * d[i];
}

/**
 * Preconditioned CG inside the trust region; leaves the step in s and −(g + Hs) in r.
 * The dense vector updates are fused into few loops: on office-sized data they cost as much as
 * the sparse passes. `inv` holds 1/M.
 */
function* solveTrustRegionStep(
  loss: LogisticLoss,
  g: Float64Array,
  m: Float64Array,
  inv: Float64Array,
  delta: number,
  w: CgScratch,
): ProductSolver<boolean> {
  const n = g.length;
  const sums = new Float64Array(3);
  let zr = startCg(g, inv, w);
  let q = 0;
  const dsq = delta * delta;
  for (let iter = 1; iter <= n; iter++) {
    yield* loss.multiplyHessian(w.d, w.hd);
    const dHd = dot(w.d, w.hd);
    if (!(dHd > 0)) return false;
    const alpha = zr / dHd;
    if (stepAlong(w, m, alpha) > dsq) {
      moveToBoundary(w, m, alpha, dsq);
      return true;
    }
    updateResidual(w, g, inv, alpha, sums);
    const [zrNew, gs, rs] = sums;
    // Quadratic model value Q(s) = gᵀs + ½sᵀHs = ½(gᵀs − rᵀs) with r = −g − Hs; stop once a CG
    // step gains little relative to what has been gained so far.
    const qNew = 0.5 * (gs - rs);
    const qDiff = qNew - q;
    q = qNew;
    if (qNew <= 0 && qDiff <= 0 && iter * qDiff >= CG_DECREASE_RATIO * qNew) return false;
    const beta = zrNew / zr;
    zr = zrNew;
    updateDirection(w, beta);
  }
  return false;
}

/** Steps back from outside the region and moves along d to its boundary (in the M-norm). */
function moveToBoundary(w: CgScratch, m: Float64Array, alpha: number, dsq: number): void {
  const { s, r, d, hd } = w;
  const n = s.length;
  for (let i = 0; i < n; i++) s[i] -= alpha * d[i];
  const sMd = dotScaled(s, m, d);
  const sMs = dotScaled(s, m, s);
  const dMd = dotScaled(d, m, d);
  const rad = Math.sqrt(sMd * sMd + dMd * (dsq - sMs));
  const a = sMd >= 0 ? (dsq - sMs) / (sMd + rad) : (rad - sMd) / dMd;
  for (let i = 0; i < n; i++) {
    s[i] += a * d[i];
    r[i] -= a * hd[i];
  }
}

/** out = a + b. */
function addInto(out: Float64Array, a: Float64Array, b: Float64Array): void {
  for (let i = 0; i < out.length; i++) out[i] = a[i] + b[i];
}

/** Refreshes the preconditioner from the Hessian diagonal at the current point. */
function* updatePreconditioner(loss: LogisticLoss, m: Float64Array, inv: Float64Array): ProductSolver<void> {
  yield* loss.diagonalHessian(m);
  for (let i = 0; i < m.length; i++) {
    m[i] = 1 - PRECONDITIONER_MIX + PRECONDITIONER_MIX * m[i];
    inv[i] = 1 / m[i];
  }
}

/** Minimises loss starting from theta (updated in place) until ‖∇f‖ ≤ target. */
export function* minimiseTrustRegion(
  loss: LogisticLoss,
  theta: Float64Array,
  target: number,
  maxIterations: number,
): ProductSolver<TrustRegionResult> {
  const n = theta.length;
  const g = new Float64Array(n);
  const m = new Float64Array(n);
  const inv = new Float64Array(n);
  const next = new Float64Array(n);
  const scratch: CgScratch = {
    s: new Float64Array(n),
    r: new Float64Array(n),
    z: new Float64Array(n),
    d: new Float64Array(n),
    hd: new Float64Array(n),
  };
  let f = yield* loss.evaluate(theta);
  yield* loss.gradient(theta, g);
  if (computeNorm(g) <= target) return { iterations: 0, converged: true };
  yield* updatePreconditioner(loss, m, inv);
  let delta = Math.sqrt(dotScaled(g, inv, g));
  let iterations = 0;
  let firstStep = true;

  while (iterations < maxIterations) {
    const reachedBoundary = yield* solveTrustRegionStep(loss, g, m, inv, delta, scratch);
    const { s, r } = scratch;
    addInto(next, theta, s);
    const gs = dot(g, s);
    const predicted = -0.5 * (gs - dot(s, r));
    const fNew = yield* loss.evaluate(next);
    const actual = f - fNew;
    const sNorm = Math.sqrt(dotScaled(s, m, s));
    if (firstStep) delta = Math.min(delta, sNorm);
    firstStep = false;
    const curvature = fNew - f - gs;
    const alpha = curvature <= 0 ? SIGMA3 : Math.max(SIGMA1, -0.5 * (gs / curvature));
    if (actual < ETA0 * predicted) delta = Math.min(alpha * sNorm, SIGMA2 * delta);
    else if (actual < ETA1 * predicted) delta = Math.max(SIGMA1 * delta, Math.min(alpha * sNorm, SIGMA2 * delta));
    else if (actual < ETA2 * predicted) delta = Math.max(SIGMA1 * delta, Math.min(alpha * sNorm, SIGMA3 * delta));
    else if (reachedBoundary) delta = SIGMA3 * delta;
    else delta = Math.max(delta, Math.min(alpha * sNorm, SIGMA3 * delta));

    if (actual > ETA0 * predicted) {
      iterations++;
      theta.set(next);
      f = fNew;
      yield* loss.gradient(theta, g);
      if (computeNorm(g) <= target) return { iterations, converged: true };
      yield* updatePreconditioner(loss, m, inv);
    }
    // A rejected step needs no restore: Hessian products use the Dᵢ fixed by the last gradient.
    if (Math.abs(actual) <= 0 && predicted <= 0) break;
    if (Math.abs(actual) <= 1e-12 * Math.abs(f) && Math.abs(predicted) <= 1e-12 * Math.abs(f)) break;
  }
  return { iterations, converged: false };
}
