// The auto-file bar (DESIGN.md §5): the lowest confidence t such that, among held-out documents
// whose top confidence is ≥ t, the share filed correctly (precision) reaches the office's target.
// Scanning thresholds from the highest confidence down, the bar is the last t where precision
// still reaches the target; documents at or above it would be auto-filed.

export interface AutoFileBar {
  target: number;
  /** null when no threshold reaches the target: auto-filing stays off. */
  threshold: number | null;
  /** Share of documents whose confidence passes the bar. */
  share: number;
  /** Precision among the documents that pass. */
  precision: number;
}

/** Finds the bar from (confidence, correct?) pairs of cross-validated or held-out predictions. */
export function findAutoFileBar(confidences: number[], correct: boolean[], target = 0.98): AutoFileBar {
  if (!(target > 0 && target <= 1)) throw new Error(`The precision target must be in (0, 1], got ${target}.`);
  const order = confidences.map((_, i) => i).sort((a, b) => confidences[b] - confidences[a]);
  let hits = 0;
  let best: AutoFileBar = { target, threshold: null, share: 0, precision: 0 };
  for (let r = 0; r < order.length; r++) {
    hits += correct[order[r]] ? 1 : 0;
    // Ties: a threshold admits every document with that confidence, so only judge at a group's end.
    if (r + 1 < order.length && confidences[order[r + 1]] === confidences[order[r]]) continue;
    const precision = hits / (r + 1);
    if (precision >= target) {
      best = { target, threshold: confidences[order[r]], share: (r + 1) / order.length, precision };
    }
  }
  return best;
}
