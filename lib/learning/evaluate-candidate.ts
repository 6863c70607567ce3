// Scores for a candidate and for the current model's settings on the same documents and the same
// split (same seed), so "not worse" compares like with like. Stratified 5-fold cross-validation
// for an office's usual few thousand filings; from HOLDOUT_FROM documents on, one stratified
// hold-out (a fifth of each class) instead, as DESIGN §5 allows for large sets: five trainings
// become one, and with that many documents a fifth still holds hundreds per class.
import { crossValidateCounts, evaluateCountSplit, type CountMatrix, type EvaluationReport, type TrainOptionsInput } from "@/lib/ml";
import { assignStratifiedFolds } from "@/lib/ml/folds";

export const FOLD_SEED = 42;
export const HOLDOUT_FROM = 5_000;

/** Five folds, or fewer when the smallest class has fewer documents (at least two). */
export function chooseFolds(labels: string[]): number {
  const counts = new Map<string, number>();
  for (const l of labels) counts.set(l, (counts.get(l) ?? 0) + 1);
  return Math.max(2, Math.min(5, ...counts.values()));
}

export function describeEvaluation(docs: number, folds: number): string {
  return docs >= HOLDOUT_FROM ? `a stratified hold-out of a fifth of ${docs} documents` : `${folds}-fold cross-validation on ${docs} documents`;
}

/** Scores settings on rows of a CountMatrix (stored term counts); `labelOf[r]` is matrix row r's label. */
export function scoreOnFolds(m: CountMatrix, rowIds: ArrayLike<number>, labelOf: string[], folds: number, options: TrainOptionsInput, target: number): Promise<EvaluationReport> {
  if (rowIds.length >= HOLDOUT_FROM) {
    const foldOf = assignStratifiedFolds(Array.from(rowIds, (r) => labelOf[r]), 5, FOLD_SEED);
    const trainRows: number[] = [];
    const testRows: number[] = [];
    for (let i = 0; i < rowIds.length; i++) (foldOf[i] !== 0 ? trainRows : testRows).push(rowIds[i]);
    return evaluateCountSplit(m, trainRows, testRows, labelOf, { ...options, precisionTarget: target });
  }
  return crossValidateCounts(m, rowIds, labelOf, folds, { ...options, seed: FOLD_SEED, precisionTarget: target });
}
