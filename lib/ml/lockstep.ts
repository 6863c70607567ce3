// Runs several solvers over the same matrix in lockstep. A solver is a generator that yields each
// sparse product it needs (rows: X·v, columns: Xᵀu, squares: (X∘X)ᵀu) and does its own dense
// arithmetic in between; each round gathers the pending requests, serves those of a kind in one
// batched pass (csr-batch.ts) and resumes every solver. Solvers that finish drop out, so the
// passes shrink to the classes still converging.
import { transposeCsr, type CsrMatrix } from "./csr";
import { multiplyRowsBatch } from "./csr-batch";

export interface ProductRequest {
  /**
   * rows:    out[i] = xᵢ·input[0..cols) + input[cols]  (the last entry is the intercept);
   * columns: out[j] += Σᵢ inputᵢ xᵢⱼ;   squares: out[j] += Σᵢ inputᵢ xᵢⱼ²   (j < cols).
   */
  kind: "rows" | "columns" | "squares";
  input: Float64Array;
  out: Float64Array;
}

export type ProductSolver<T> = Generator<ProductRequest, T, void>;

const KINDS = ["rows", "columns", "squares"] as const;
/**
 * Solvers served per pass. Eight interleaved vectors of a 30,000-term vocabulary fill about 2 MB,
 * one core's L2 cache on the machines we measured; a wider group ran slower per class (CUAD:
 * 0.5 ms per class and pass at 8, 1.1 ms at 16 to 41, 1.3–2 ms for one class alone).
 */
const GROUP_SIZE = 8;
const PADDED_SIZE = 8;

/** The matrix, its transpose and its transpose with squared values, built once per run. */
interface Matrices {
  x: CsrMatrix;
  xt: CsrMatrix;
  xtSquared: CsrMatrix;
}

/** packed[j·k + s] = inputs[s][j] for j < length. */
function pack(group: ProductRequest[], length: number, k: number, packed: Float64Array): void {
  for (let s = 0; s < group.length; s++) {
    const input = group[s].input;
    for (let j = 0, q = s; j < length; j++, q += k) packed[q] = input[j];
  }
}

/** Serves one kind of request for a group of solvers with one pass over the matrix. */
function serveGroup(m: Matrices, group: ProductRequest[], packed: Float64Array, result: Float64Array): void {
  const { x } = m;
  const { rows, cols } = x;
  // Padded to a multiple of four so no slot runs alone (a lone slot costs a whole pass); the
  // padding slots hold stale numbers whose results are never read.
  const k = Math.ceil(group.length / 4) * 4;
  if (group[0].kind === "rows") {
    pack(group, cols, k, packed);
    multiplyRowsBatch(x, packed, k, result);
    for (let s = 0; s < group.length; s++) {
      const { input, out } = group[s];
      const bias = input[cols];
      for (let i = 0, q = s; i < rows; i++, q += k) out[i] = result[q] + bias;
    }
    return;
  }
  pack(group, rows, k, packed);
  multiplyRowsBatch(group[0].kind === "squares" ? m.xtSquared : m.xt, packed, k, result);
  for (let s = 0; s < group.length; s++) {
    const out = group[s].out;
    for (let j = 0, q = s; j < cols; j++, q += k) out[j] += result[q];
  }
}

/** Runs every solver to completion; returns their results in the order given. */
export function solveTogether<T>(x: CsrMatrix, solvers: Array<ProductSolver<T>>): T[] {
  const size = Math.max(x.rows, x.cols) * PADDED_SIZE;
  const packed = new Float64Array(size);
  const result = new Float64Array(size);
  const m: Matrices = { x, xt: transposeCsr(x), xtSquared: transposeCsr(x, true) };
  const results = new Array<T>(solvers.length);
  const pending = new Array<ProductRequest>(solvers.length);
  let active: number[] = [];
  const advance = (a: number): boolean => {
    const step = solvers[a].next();
    if (step.done) results[a] = step.value;
    else pending[a] = step.value;
    return !step.done;
  };
  for (let a = 0; a < solvers.length; a++) if (advance(a)) active.push(a);
  // Kinds are served in a fixed cycle and a served solver moves on at once, so one that asks for
  // rows then columns is served twice in a cycle; serving every pending request each round instead
  // let the classes drift out of phase and nearly doubled the passes.
  while (active.length > 0) {
    for (const kind of KINDS) {
      const members = active.filter((a) => pending[a].kind === kind);
      for (let g = 0; g < members.length; g += GROUP_SIZE) {
        serveGroup(m, members.slice(g, g + GROUP_SIZE).map((a) => pending[a]), packed, result);
      }
      const finished = new Set(members.filter((a) => !advance(a)));
      if (finished.size > 0) active = active.filter((a) => !finished.has(a));
    }
  }
  return results;
}

/** Runs one solver on its own (same arithmetic as in a group, so the same result). */
export function solveAlone<T>(x: CsrMatrix, solver: ProductSolver<T>): T {
  return solveTogether(x, [solver])[0];
}
