// Computes a document's suggestion: ranked cabinet types from the current model (or, before any
// model exists or for types with too few examples, from the types' descriptions and keywords),
// matter candidates from identifiers in the text, and whether the office's auto-file bar is met.
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { FOLDWRIGHT } from "@/lib/data/users";
import { getOfficeSettings } from "@/lib/data/settings";
import type { DocumentForSuggestion } from "@/lib/data/suggestions";
import type { NewSuggestion, RankedType } from "@/lib/filing/suggestion";
import { findKindByMediaType } from "@/lib/intake";
import { decodeTermCounts, predictCounts, predictDocument, type MlDocument } from "@/lib/ml";
import { blendWithModel, buildTypeProfiles, rankByProfiles, type TypeProfiles } from "@/lib/filing/cold-start";
import { decideMatter, matchMatters } from "@/lib/filing/match-matter";
import { getServingModel } from "@/lib/learning/model-store";

// The cabinet types' description profiles change only when an admin edits the types: built once
// per set of types, not once per document.
let profiles: { key: string; value: TypeProfiles } | null = null;
function profilesFor(types: { id: number; name: string; description: string; keywords: string[] }[]): TypeProfiles {
  const key = JSON.stringify(types.map((t) => [t.id, t.name, t.description, t.keywords]));
  if (profiles?.key !== key) profiles = { key, value: buildTypeProfiles(types) };
  return profiles.value;
}

export async function computeSuggestion(doc: DocumentForSuggestion): Promise<NewSuggestion> {
  const [types, matters, settings, serving] = await Promise.all([listCabinetTypes(FOLDWRIGHT, true), listVisibleMatters(FOLDWRIGHT), getOfficeSettings(FOLDWRIGHT), getServingModel()]);
  const text = doc.text ?? "";
  const mlDoc: MlDocument = { text, filename: doc.original_name, meta: { kind: findKindByMediaType(doc.media_type) ?? "other", pages: doc.page_count ?? undefined, ocr: Boolean(doc.ocr_used) } };
  const activeIds = new Set(types.map((t) => t.id));
  const cold = rankByProfiles({ text, filename: doc.original_name }, profilesFor(types));

  let ranked: RankedType[];
  let method: NewSuggestion["method"] = "cold_start";
  let why: NewSuggestion["why"] = cold.terms.map((term) => ({ term, weight: 0 }));
  let noConfidentMatch = false;
  let modelTop: { cabinetTypeId: number; confidence: number } | null = null;
  if (serving) {
    // Stored counts when the document has them (tokenised once, when it was read).
    const prediction = doc.term_counts ? predictCounts(serving.model, [decodeTermCounts(doc.term_counts)], 6)[0] : predictDocument(serving.model, mlDoc, 6);
    const counts = serving.model.counts;
    const modelRanked = prediction.ranked
      .map((r) => ({ cabinetTypeId: Number(r.label), confidence: r.confidence, probability: r.probability }))
      .filter((r) => activeIds.has(r.cabinetTypeId));
    const coldTypeIds = types.filter((t) => (counts[String(t.id)] ?? 0) < settings.minExamplesPerType).map((t) => t.id);
    ranked = blendWithModel(modelRanked, cold.ranked, coldTypeIds);
    method = coldTypeIds.length ? "blended" : "model";
    why = prediction.why.map((w) => ({ term: w.term, weight: w.contribution }));
    noConfidentMatch = prediction.noConfidentMatch;
    modelTop = modelRanked[0] ?? null;
  } else {
    ranked = cold.ranked.map((r) => ({ cabinetTypeId: r.cabinetTypeId, confidence: r.confidence, probability: null, source: "description" as const }));
  }

  const candidates = matchMatters(text, doc.original_name, matters);
  const decision = decideMatter(candidates);
  const top = ranked[0];
  // The bar was measured on the model's own confidences, so it is compared with the model's
  // confidence in the top type, not the blended one (which gives untrained types a share).
  const modelConfidence = modelTop && top?.cabinetTypeId === modelTop.cabinetTypeId ? modelTop.confidence : null;
  const autoFile =
    settings.autoFileEnabled &&
    serving !== null &&
    serving.autoFileThreshold !== null &&
    top?.source === "model" &&
    !noConfidentMatch &&
    modelConfidence !== null &&
    modelConfidence >= serving.autoFileThreshold &&
    decision.matterId !== null &&
    !decision.ambiguous;

  return {
    documentId: doc.id,
    modelVersionId: serving?.versionId ?? null,
    method,
    ranked,
    noConfidentMatch,
    modelConfidence,
    why,
    matterCandidates: candidates.slice(0, 5),
    topMatterId: decision.matterId,
    matterAmbiguous: decision.ambiguous,
    autoFile,
  };
}
