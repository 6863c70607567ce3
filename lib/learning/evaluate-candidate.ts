// Cross-validated scores for a candidate and for the current model's settings on the same
// folds (same documents, same seed), so "not worse" compares like with like.
import { crossValidate, type EvaluationReport, type LabelledDocument, type TrainOptionsInput } from "@/lib/ml";

export const FOLD_SEED = 42;

/** Five folds, or fewer when the smallest class has fewer documents (at least two). */
export function chooseFolds(labels: string[]): number {
  const counts = new Map<string, number>();
  for (const l of labels) counts.set(l, (counts.get(l) ?? 0) + 1);
  return Math.max(2, Math.min(5, ...counts.values()));
}

export function scoreOnFolds(docs: LabelledDocument[], folds: number, options: TrainOptionsInput, target: number): Promise<EvaluationReport> {
  return crossValidate(docs, folds, { ...options, seed: FOLD_SEED, precisionTarget: target });
}
