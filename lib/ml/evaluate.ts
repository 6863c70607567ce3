// Evaluation (DESIGN.md §5): a given train/test split, or stratified k-fold cross-validation
// whose out-of-fold predictions are pooled (like scikit-learn's cross_val_predict) before the
// metrics and the auto-file bar are computed. Each fold fits its own vocabulary, so no word of a
// held-out document leaks into training.
import { findAutoFileBar, type AutoFileBar } from "./auto-file";
import { assignStratifiedFolds } from "./folds";
import { computeMetrics, type ClassificationMetrics } from "./metrics";
import { predictRows, type Prediction } from "./predict";
import { resolveOptions, trainOnCounts, type TrainOptionsInput } from "./model";
import { allRows, columnsUnder, countMatrixOf, transformCountRows, type CountMatrix } from "./term-counts";
import type { LabelledDocument } from "./types";
import { checkLabels, checkTrainingSet } from "./validate";

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
  checkTrainingSet(train);
  const resolved = resolveOptions(options);
  const t0 = performance.now();
  const m = countMatrixOf([...train, ...test], resolved.tokenize);
  const tokenizeMs = performance.now() - t0;
  const rows = allRows(m.rows);
  const report = await evaluateCountSplit(m, rows.subarray(0, train.length), rows.subarray(train.length), [...train, ...test].map((d) => d.label), options);
  report.timings.vectoriseMs += tokenizeMs;
  return report;
}

/**
 * evaluateSplit on rows of a CountMatrix (stored term counts): `labelOf[r]` is row r's label.
 * The vocabulary is fitted on the training rows only.
 */
export async function evaluateCountSplit(m: CountMatrix, trainRows: ArrayLike<number>, testRows: ArrayLike<number>, labelOf: string[], options: EvaluationOptions = {}): Promise<EvaluationReport> {
  if (testRows.length === 0) throw new Error("There are no test documents.");
  const model = await trainOnCounts(m, trainRows, Array.from(trainRows, (r) => labelOf[r]), options);
  const t0 = performance.now();
  const x = transformCountRows(m, testRows, columnsUnder(m, model.vocabulary), model.vocabulary);
  const t1 = performance.now();
  const preds = predictRows(model, x, model.options.floor, 0);
  const t2 = performance.now();
  return {
    method: "split",
    folds: null,
    seed: null,
    vocabularySize: model.terms.length,
    ...summarise(model.classes, Array.from(testRows, (r) => labelOf[r]), preds, options.precisionTarget ?? 0.98),
    timings: { vectoriseMs: model.timings.vectoriseMs + (t1 - t0), fitMs: model.timings.fitMs, predictMs: t2 - t1 },
  };
}

/** Stratified k-fold cross-validation with a fixed seed. */
export async function crossValidate(docs: LabelledDocument[], folds = 5, options: EvaluationOptions = {}): Promise<EvaluationReport> {
  checkTrainingSet(docs);
  const resolved = resolveOptions(options);
  const t0 = performance.now();
  const m = countMatrixOf(docs, resolved.tokenize);
  const tokenizeMs = performance.now() - t0;
  const report = await crossValidateCounts(m, allRows(m.rows), docs.map((d) => d.label), folds, options);
  report.timings.vectoriseMs += tokenizeMs;
  return report;
}

/**
 * crossValidate on rows of a CountMatrix (stored term counts); `labelOf[r]` is matrix row r's
 * label. Folds are drawn over `rowIds` in their order, as crossValidate draws them over its documents.
 */
export async function crossValidateCounts(m: CountMatrix, rowIds: ArrayLike<number>, labelOf: string[], folds = 5, options: EvaluationOptions = {}): Promise<EvaluationReport> {
  const labels = Array.from(rowIds, (r) => labelOf[r]);
  checkLabels(labels, rowIds.length);
  const seed = options.seed ?? 42;
  const resolved = resolveOptions(options);
  const foldOf = assignStratifiedFolds(labels, folds, seed);
  const preds: Prediction[] = new Array(labels.length);
  const timings: EvaluationTimings = { vectoriseMs: 0, fitMs: 0, predictMs: 0 };
  let vocabularySize = 0;
  for (let f = 0; f < folds; f++) {
    const trainAt: number[] = [];
    const testAt: number[] = [];
    for (let i = 0; i < labels.length; i++) (foldOf[i] !== f ? trainAt : testAt).push(i);
    const model = await trainOnCounts(m, trainAt.map((i) => rowIds[i]), trainAt.map((i) => labels[i]), { ...resolved, priors: options.priors });
    const t0 = performance.now();
    const x = transformCountRows(m, testAt.map((i) => rowIds[i]), columnsUnder(m, model.vocabulary), model.vocabulary);
    const t1 = performance.now();
    predictRows(model, x, resolved.floor, 0).forEach((p, r) => (preds[testAt[r]] = p));
    const t2 = performance.now();
    timings.vectoriseMs += model.timings.vectoriseMs + (t1 - t0);
    timings.fitMs += model.timings.fitMs;
    timings.predictMs += t2 - t1;
    vocabularySize += model.terms.length / folds;
  }
  return {
    method: "k-fold",
    folds,
    seed,
    vocabularySize: Math.round(vocabularySize),
    ...summarise([...new Set(labels)].sort(), labels, preds, options.precisionTarget ?? 0.98),
    timings,
  };
}
