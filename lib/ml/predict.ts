// Prediction (DESIGN.md §5): pₖ = σ(wₖ·x + bₖ) for every class, independently (one-vs-rest), so
// the pₖ need not sum to one; the confidence shown is pₖ / Σⱼ pⱼ. The suggestion is the arg max
// (the same class under either), runner-ups follow in order, and below `floor` the result says
// "no confident match". Why: the terms with the largest wₖⱼ·xⱼ for the suggested class k.
import type { CsrMatrix } from "./csr";
import { sigmoid } from "./logistic-loss";

export interface LinearClassifier {
  classes: string[];
  terms: string[];
  /** Row-major classes × terms. */
  weights: Float32Array | Float64Array;
  intercepts: Float64Array;
}

export interface ClassScore {
  label: string;
  /** Raw σ(w·x + b) of this class's binary model. */
  probability: number;
  /** probability normalised over all classes (sums to 1). */
  confidence: number;
}

export interface WhyTerm {
  term: string;
  /** wₖⱼ·xⱼ: how much this term pushed the suggested class. */
  contribution: number;
}

export interface Prediction {
  /** The suggestion: the arg max, even when it is not confident. */
  label: string;
  confidence: number;
  /** True when the top confidence is below the floor: show "no confident match". */
  noConfidentMatch: boolean;
  /** Every class, best first. */
  ranked: ClassScore[];
  why: WhyTerm[];
}

/** Scores one row of x against every class: σ(wₖ·x + bₖ). */
export function scoreRow(model: LinearClassifier, x: CsrMatrix, row: number): Float64Array {
  const cols = model.terms.length;
  const out = new Float64Array(model.classes.length);
  const start = x.indptr[row];
  const end = x.indptr[row + 1];
  for (let k = 0; k < out.length; k++) {
    let z = model.intercepts[k];
    const base = k * cols;
    for (let p = start; p < end; p++) z += model.weights[base + x.indices[p]] * x.data[p];
    out[k] = sigmoid(z);
  }
  return out;
}

/** Ranks classes by probability; ties keep class order so the result is deterministic. */
export function rankScores(classes: string[], probabilities: Float64Array): ClassScore[] {
  let total = 0;
  for (const p of probabilities) total += p;
  const ranked = classes.map((label, k) => ({ label, probability: probabilities[k], confidence: probabilities[k] / total }));
  return ranked.sort((a, b) => b.probability - a.probability);
}

/** The terms that push class k most for one row. */
export function explainRow(model: LinearClassifier, x: CsrMatrix, row: number, k: number, count: number): WhyTerm[] {
  const base = k * model.terms.length;
  const terms: WhyTerm[] = [];
  for (let p = x.indptr[row]; p < x.indptr[row + 1]; p++) {
    const contribution = model.weights[base + x.indices[p]] * x.data[p];
    if (contribution > 0) terms.push({ term: model.terms[x.indices[p]], contribution });
  }
  return terms.sort((a, b) => b.contribution - a.contribution).slice(0, count);
}

/** Predicts every row of x. */
export function predictRows(model: LinearClassifier, x: CsrMatrix, floor: number, whyCount = 5): Prediction[] {
  const out: Prediction[] = [];
  for (let i = 0; i < x.rows; i++) {
    const ranked = rankScores(model.classes, scoreRow(model, x, i));
    const top = ranked[0];
    const k = model.classes.indexOf(top.label);
    out.push({
      label: top.label,
      confidence: top.confidence,
      noConfidentMatch: top.confidence < floor,
      ranked,
      why: whyCount > 0 ? explainRow(model, x, i, k, whyCount) : [],
    });
  }
  return out;
}
