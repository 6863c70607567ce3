// Merges the model's ranking (which knows only the types it was trained on) with the cold-start
// ranking (which knows every active type from its description), so that a type with too few
// examples still appears, and the confidences of the final list sum to 1.
//
// Rule: let C be the cold types (those in `coldTypeIds`, plus any type the cold-start ranking has
// and the model does not), and q(t) the cold-start confidence of t over all types. The cold-start
// ranking has seen every type, so Q = Σ_{t∈C} q(t) is its estimate of how likely the document is
// to be of a cold type at all. Each cold type keeps q(t); the model's remaining types share 1 − Q
// in proportion to the model's own confidences (renormalised after dropping any cold type the
// model had, since its few examples make its model score unreliable). With no model type left,
// the cold types share the whole mass; with no cold type, the model ranking stands as it is.
// Order: confidence, then model before description, then type id, so the result is deterministic.

export interface ModelRankedType {
  cabinetTypeId: number;
  /** The model's confidence over its own types. */
  confidence: number;
  /** Raw σ(w·x + b), kept for the record. */
  probability?: number | null;
}

export interface BlendedType {
  cabinetTypeId: number;
  confidence: number;
  probability: number | null;
  source: "model" | "description";
}

/** One ranking over model and cold types whose confidences sum to 1. */
export function blendWithModel(
  modelRanked: ModelRankedType[],
  coldRanked: { cabinetTypeId: number; confidence: number }[],
  coldTypeIds: number[],
): BlendedType[] {
  const modelIds = new Set(modelRanked.map((r) => r.cabinetTypeId));
  const cold = new Set([...coldTypeIds, ...coldRanked.map((r) => r.cabinetTypeId).filter((id) => !modelIds.has(id))]);
  const coldTotal = coldRanked.reduce((sum, r) => sum + r.confidence, 0);
  const q = new Map(coldRanked.map((r) => [r.cabinetTypeId, coldTotal > 0 ? r.confidence / coldTotal : 0]));
  const model = modelRanked.filter((r) => !cold.has(r.cabinetTypeId));
  const modelTotal = model.reduce((sum, r) => sum + r.confidence, 0);
  const coldMass = [...cold].reduce((sum, id) => sum + (q.get(id) ?? 0), 0);

  const out: BlendedType[] = [];
  if (model.length > 0) {
    // A model whose confidences are all zero still gets its share, split evenly.
    const remaining = 1 - coldMass;
    for (const r of model) {
      const p = modelTotal > 0 ? r.confidence / modelTotal : 1 / model.length;
      out.push({ cabinetTypeId: r.cabinetTypeId, confidence: remaining * p, probability: r.probability ?? null, source: "model" });
    }
  }
  // Alone, the cold types share everything; with no evidence at all, evenly.
  const coldScale = model.length > 0 ? 1 : coldMass > 0 ? 1 / coldMass : 0;
  for (const id of cold) {
    const confidence = coldScale > 0 ? (q.get(id) ?? 0) * coldScale : model.length > 0 ? 0 : 1 / cold.size;
    out.push({ cabinetTypeId: id, confidence, probability: null, source: "description" });
  }
  return out.sort(
    (a, b) => b.confidence - a.confidence || (a.source === b.source ? 0 : a.source === "model" ? -1 : 1) || a.cabinetTypeId - b.cabinetTypeId,
  );
}
