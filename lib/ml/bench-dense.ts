// The benchmark's baseline: ml-logistic-regression (dense fixed-step gradient descent, no
// intercept, no regularisation) against our trainer on a small dense subset of CUAD — the three
// most frequent clause types, 100 spans each, the 300 most frequent terms as dense columns.
import MlLogisticRegression from "ml-logistic-regression";
import { Matrix } from "ml-matrix";
import { buildCsrFromDense } from "./csr";
import { trainOneVsRest } from "./one-vs-rest";
import { fitVocabulary, transformTokens } from "./tfidf";
import { tokenizeDocument } from "./tokenize";
import type { LabelledDocument } from "./types";

const round = (v: number, d = 3) => Math.round(v * 10 ** d) / 10 ** d;

/** Picks the subset and returns dense rows with class ids. */
function buildDenseSubset(train: LabelledDocument[]): { rows: number[][]; labels: number[] } {
  const counts = new Map<string, number>();
  for (const d of train) counts.set(d.label, (counts.get(d.label) ?? 0) + 1);
  const top = [...counts.entries()].sort((a, b) => b[1] - a[1]).slice(0, 3).map(([l]) => l);
  const taken = new Map<string, number>();
  const docs = train.filter((d) => {
    const n = taken.get(d.label) ?? 0;
    if (!top.includes(d.label) || n >= 100) return false;
    taken.set(d.label, n + 1);
    return true;
  });
  const tokens = docs.map((d) => tokenizeDocument(d));
  const vocab = fitVocabulary(tokens, { minDf: 2, maxDf: 1, maxFeatures: 300 });
  const x = transformTokens(tokens, vocab);
  const rows = Array.from({ length: x.rows }, (_, i) => {
    const dense = new Array<number>(x.cols).fill(0);
    for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) dense[x.indices[p]] = x.data[p];
    return dense;
  });
  return { rows, labels: docs.map((d) => top.indexOf(d.label)) };
}

/** Times both trainers on the subset and reports training accuracy and arg-max agreement. */
export async function runDenseBaseline(train: LabelledDocument[]) {
  const { rows, labels } = buildDenseSubset(train);
  let t = performance.now();
  const baseline = new MlLogisticRegression({ numSteps: 2000, learningRate: 5e-3 });
  baseline.train(new Matrix(rows), Matrix.columnVector(labels));
  const theirs = baseline.predict(new Matrix(rows));
  const theirSeconds = (performance.now() - t) / 1000;
  t = performance.now();
  const x = buildCsrFromDense(rows);
  const ours = await trainOneVsRest(x, Int32Array.from(labels), 3, { C: 30, tolerance: 1e-3, maxIterations: 200, balanced: false, threads: 1 });
  const oursSeconds = (performance.now() - t) / 1000;
  const mine = rows.map((_, i) => {
    let best = 0;
    let bestZ = -Infinity;
    for (let k = 0; k < 3; k++) {
      let z = ours.intercepts[k];
      for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) z += ours.weights[k * x.cols + x.indices[p]] * x.data[p];
      if (z > bestZ) [best, bestZ] = [k, z];
    }
    return best;
  });
  const accuracy = (pred: number[]) => pred.filter((p, i) => p === labels[i]).length / labels.length;
  return {
    shape: [rows.length, rows[0].length],
    mlLogisticRegression: { numSteps: 2000, fitSeconds: round(theirSeconds), trainingAccuracy: round(accuracy(theirs), 4) },
    ours: { fitSeconds: round(oursSeconds, 4), trainingAccuracy: round(accuracy(mine), 4) },
    fitRatio: round(oursSeconds / theirSeconds, 4),
    argMaxAgreement: round(mine.filter((p, i) => p === theirs[i]).length / rows.length, 4),
  };
}
