// Classification metrics with scikit-learn's definitions (classification_report,
// confusion_matrix): per class precision = TP / predicted, recall = TP / support,
// F1 = 2PR / (P + R), each 0 when its denominator is 0; macro = plain mean over classes,
// weighted = mean weighted by support; top-3 accuracy = true class among the three best.
// Rows of the confusion matrix are true classes, columns predicted ones.

export interface ClassMetrics {
  label: string;
  precision: number;
  recall: number;
  f1: number;
  support: number;
}

export interface ClassificationMetrics {
  documents: number;
  accuracy: number;
  top3Accuracy: number;
  macroF1: number;
  weightedF1: number;
  perClass: ClassMetrics[];
  confusion: { labels: string[]; matrix: number[][] };
}

/** Counts true × predicted pairs over class ids 0..labels.length−1. */
export function computeConfusion(truth: ArrayLike<number>, predicted: ArrayLike<number>, classCount: number): number[][] {
  if (truth.length !== predicted.length) throw new Error("truth and predicted must have the same length.");
  const matrix = Array.from({ length: classCount }, () => new Array<number>(classCount).fill(0));
  for (let i = 0; i < truth.length; i++) matrix[truth[i]][predicted[i]]++;
  return matrix;
}

/** Per-class precision, recall, F1 and support from a confusion matrix. */
export function computePerClass(labels: string[], matrix: number[][]): ClassMetrics[] {
  return labels.map((label, k) => {
    const tp = matrix[k][k];
    const support = matrix[k].reduce((a, b) => a + b, 0);
    let predicted = 0;
    for (const row of matrix) predicted += row[k];
    const precision = predicted > 0 ? tp / predicted : 0;
    const recall = support > 0 ? tp / support : 0;
    const f1 = precision + recall > 0 ? (2 * precision * recall) / (precision + recall) : 0;
    return { label, precision, recall, f1, support };
  });
}

/**
 * All metrics at once. `topRanked[i]` lists class ids best first (at least one) for row i.
 * Classes with no support still count in the macro mean, as in scikit-learn when they are
 * passed as `labels`; we only list classes of the model.
 */
export function computeMetrics(labels: string[], truth: ArrayLike<number>, topRanked: number[][]): ClassificationMetrics {
  const predicted = topRanked.map((r) => r[0]);
  const matrix = computeConfusion(truth, predicted, labels.length);
  const perClass = computePerClass(labels, matrix);
  let correct = 0;
  let top3 = 0;
  for (let i = 0; i < truth.length; i++) {
    if (predicted[i] === truth[i]) correct++;
    if (topRanked[i].slice(0, 3).includes(truth[i])) top3++;
  }
  const n = truth.length;
  const supportTotal = perClass.reduce((a, c) => a + c.support, 0);
  return {
    documents: n,
    accuracy: n > 0 ? correct / n : 0,
    top3Accuracy: n > 0 ? top3 / n : 0,
    macroF1: perClass.reduce((a, c) => a + c.f1, 0) / Math.max(1, perClass.length),
    weightedF1: supportTotal > 0 ? perClass.reduce((a, c) => a + c.f1 * c.support, 0) / supportTotal : 0,
    perClass,
    confusion: { labels, matrix },
  };
}
