// ml-logistic-regression 2.0.0 ships no types; only what the cross-check and benchmark use.
declare module "ml-logistic-regression" {
  import type { Matrix } from "ml-matrix";
  export default class LogisticRegression {
    constructor(options?: { numSteps?: number; learningRate?: number });
    train(x: Matrix, y: Matrix): void;
    predict(x: Matrix): number[];
  }
}
