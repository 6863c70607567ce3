// Evaluation (DESIGN.md §5): a given train/test split, or stratified k-fold cross-validation
// whose out-of-fold predictions are pooled (like scikit-learn's cross_val_predict) before the
// metrics and the auto-file bar are computed. Each fold fits its own vocabulary, so no word of a
// held-out document leaks into training.
import { findAutoFileBar, type AutoFileBar } from "./auto-file";
import { assignStratifiedFolds } from "./folds";
import { computeMetrics, type ClassificationMetrics } from "./metrics";
import { predictRows, type Prediction } from "./predict";
import { resolveOptions, tokenizeAll, trainModel, type TrainOptionsInput } from "./model";
import { transformTokens } from "./tfidf";
import type { LabelledDocument } from "./types";
import { checkTrainingSet } from "./validate";

export interface EvaluationTimings {
  vectoriseMs: number;
  fitMs: number;
  predictMs: number;
}

export interface EvaluationReport extends ClassificationMetrics {
  method: "split" | "k-fold";
  folds: number | null;
  seed: number | null;
  vocabularySize: number;
  autoFile: AutoFileBar;
  timings: EvaluationTimings;
}

export interface EvaluationOptions extends TrainOptionsInput {
  /** Precision the auto-file bar must reach (default 0.98). */
  precisionTarget?: number;
  seed?: number;
}

/** Pools predictions and truths into one report. */
function summarise(labels: string[], truth: string[], preds: Prediction[], target: number): Omit<EvaluationReport, "method" | "folds" | "seed" | "vocabularySize" | "timings"> {
  const all = [...labels, ...[...new Set(truth)].filter((t) => !labels.includes(t)).sort()];
  const id = new Map(all.map((l, k) => [l, k]));
  const truthIds = truth.map((t) => id.get(t)!);
  const ranked = preds.map((p) => p.ranked.map((r) => id.get(r.label)!));
  const metrics = computeMetrics(all, truthIds, ranked);
  const autoFile = findAutoFileBar(
    preds.map((p) => p.confidence),
    preds.map((p, i) => p.label === truth[i]),
    target,
  );
  return { ...metrics, autoFile };
}

/** Trains on `train`, predicts `test` and reports metrics with timings. */
export async function evaluateSplit(train: LabelledDocument[], test: LabelledDocument[], options: EvaluationOptions = {}): Promise<EvaluationReport> {
  if (test.length === 0) throw new Error("There are no test documents.");
  const model = await trainModel(train, options);
  const t0 = performance.now();
  const x = transformTokens(tokenizeAll(test, model.options.tokenize), model.vocabulary);
  const t1 = performance.now();
  const preds = predictRows(model, x, model.options.floor, 0);
  const t2 = performance.now();
  return {
    method: "split",
    folds: null,
    seed: null,
    vocabularySize: model.terms.length,
    ...summarise(model.classes, test.map((d) => d.label), preds, options.precisionTarget ?? 0.98),
    timings: { vectoriseMs: model.timings.vectoriseMs + (t1 - t0), fitMs: model.timings.fitMs, predictMs: t2 - t1 },
  };
}

/** Stratified k-fold cross-validation with a fixed seed. */
export async function crossValidate(docs: LabelledDocument[], folds = 5, options: EvaluationOptions = {}): Promise<EvaluationReport> {
  checkTrainingSet(docs);
  const seed = options.seed ?? 42;
  const resolved = resolveOptions(options);
  const foldOf = assignStratifiedFolds(docs.map((d) => d.label), folds, seed);
  const preds: Prediction[] = new Array(docs.length);
  const timings: EvaluationTimings = { vectoriseMs: 0, fitMs: 0, predictMs: 0 };
  let vocabularySize = 0;
  for (let f = 0; f < folds; f++) {
    const trainDocs = docs.filter((_, i) => foldOf[i] !== f);
    const testRows = docs.map((_, i) => i).filter((i) => foldOf[i] === f);
    const model = await trainModel(trainDocs, resolved);
    const t0 = performance.now();
    const x = transformTokens(tokenizeAll(testRows.map((i) => docs[i]), resolved.tokenize), model.vocabulary);
    const t1 = performance.now();
    predictRows(model, x, resolved.floor, 0).forEach((p, r) => (preds[testRows[r]] = p));
    const t2 = performance.now();
    timings.vectoriseMs += model.timings.vectoriseMs + (t1 - t0);
    timings.fitMs += model.timings.fitMs;
    timings.predictMs += t2 - t1;
    vocabularySize += model.terms.length / folds;
  }
  const labels = [...new Set(docs.map((d) => d.label))].sort();
  return {
    method: "k-fold",
    folds,
    seed,
    vocabularySize: Math.round(vocabularySize),
    ...summarise(labels, docs.map((d) => d.label), preds, options.precisionTarget ?? 0.98),
    timings,
  };
}
