import { beforeAll, describe, expect, it } from "vitest";
import type { CsrMatrix } from "@/lib/ml/csr";
import { createLogisticLoss } from "@/lib/ml/logistic-loss";
import { solveAlone } from "@/lib/ml/lockstep";
import { trainOneVsRest, type OneVsRestModel } from "@/lib/ml/one-vs-rest";
import { fitVocabulary, transformTokens } from "@/lib/ml/tfidf";
import { tokenizeDocument } from "@/lib/ml/tokenize";
import { exportCsr, runPythonReference } from "@/lib/ml/reference/export";
import { mostFrequentLabels, readCuad, requireSklearn, sliceCuad } from "./helpers";

interface SkFit {
  sklearn: string;
  weights: number[][];
  intercepts: number[];
  predictions: number[];
}

// A slice of CUAD (The Atticus Project, CC BY 4.0): the 8 most frequent clause types, at most 120
// training and 60 test spans each, vectorised by our own pipeline and fed to both solvers.
// Reference: OneVsRestClassifier(LogisticRegression(C=30, solver="lbfgs", tol=1e-10,
// max_iter=100000)) from Debian's python3-sklearn. Tolerance: |Δw| ≤ 1e-3·max(1, max|w|).
// scipy's L-BFGS-B also stops on a relative change of the objective, so the reference is the
// less converged side; we check too that our objective is never worse than its.
const C = 30;
let x: CsrMatrix;
let xTest: CsrMatrix;
let labels: Int32Array;
let classCount: number;
let sk: SkFit;
let ours: OneVsRestModel;

beforeAll(async () => {
  requireSklearn();
  const train = readCuad("train");
  const top = mostFrequentLabels(train, 8).sort();
  const trainSlice = sliceCuad(train, top, 120);
  const testSlice = sliceCuad(readCuad("test"), top, 60);
  const tokens = trainSlice.map((d) => tokenizeDocument(d));
  const vocab = fitVocabulary(tokens, { minDf: 2, maxDf: 1, maxFeatures: 1_000_000 });
  x = transformTokens(tokens, vocab);
  xTest = transformTokens(testSlice.map((d) => tokenizeDocument(d)), vocab);
  labels = Int32Array.from(trainSlice, (d) => top.indexOf(d.label));
  classCount = top.length;
  ours = await trainOneVsRest(x, labels, classCount, { C, tolerance: 1e-10, maxIterations: 1000, balanced: false, threads: 2 });
  sk = runPythonReference<SkFit>("sklearn_reference.py", {
    train: exportCsr(x),
    labels: Array.from(labels),
    test: exportCsr(xTest),
    C,
    solver: "lbfgs",
    tol: 1e-10,
    maxIter: 100000,
  });
}, 120_000);

/** The class-k objective at (w, b), with labels ±1 for class k against the rest. */
function objective(k: number, w: ArrayLike<number>, b: number): number {
  const y = Float64Array.from(labels, (l) => (l === k ? 1 : -1));
  const loss = createLogisticLoss({ x, y, cost: new Float64Array(x.rows).fill(C) });
  const theta = new Float64Array(x.cols + 1);
  theta.set(Array.from(w));
  theta[x.cols] = b;
  return solveAlone(x, loss.evaluate(theta));
}

describe("same optimum as scikit-learn on a CUAD slice", () => {
  it("trains one binary model per class", () => {
    expect(ours.iterations.length).toBe(classCount);
    expect(ours.weights.length).toBe(classCount * x.cols);
    expect(sk.weights.length).toBe(classCount);
  });

  it("matches lbfgs's weights and intercepts", () => {
    const scale = Math.max(1, ...sk.weights.flat().map(Math.abs));
    let maxDiff = 0;
    for (let k = 0; k < classCount; k++) {
      sk.weights[k].forEach((w, j) => (maxDiff = Math.max(maxDiff, Math.abs(w - ours.weights[k * x.cols + j]))));
      maxDiff = Math.max(maxDiff, Math.abs(sk.intercepts[k] - ours.intercepts[k]));
    }
    console.info(`CUAD slice (${x.rows}×${x.cols}): max |w_ours − w_sklearn ${sk.sklearn}| = ${maxDiff.toExponential(2)} (scale ${scale.toFixed(2)})`);
    expect(maxDiff).toBeLessThanOrEqual(1e-3 * scale);
  });

  it("reaches an objective no worse than lbfgs's for every class", () => {
    for (let k = 0; k < classCount; k++) {
      const mine = objective(k, ours.weights.subarray(k * x.cols, (k + 1) * x.cols), ours.intercepts[k]);
      const theirs = objective(k, sk.weights[k], sk.intercepts[k]);
      expect(mine).toBeLessThanOrEqual(theirs * (1 + 1e-9));
    }
  });

  it("predicts the same classes on the test slice", () => {
    const predicted: number[] = [];
    for (let i = 0; i < xTest.rows; i++) {
      let best = 0;
      let bestZ = -Infinity;
      for (let k = 0; k < classCount; k++) {
        let z = ours.intercepts[k];
        for (let p = xTest.indptr[i]; p < xTest.indptr[i + 1]; p++) z += ours.weights[k * x.cols + xTest.indices[p]] * xTest.data[p];
        if (z > bestZ) [best, bestZ] = [k, z];
      }
      predicted.push(best);
    }
    expect(predicted).toEqual(sk.predictions);
  });
});
