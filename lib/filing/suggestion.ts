// The shape of a suggestion, made by lib/learning/suggest.ts (the model, cold start and matter
// matching of this folder) and stored by lib/data/suggestions.ts with its "suggested" event.
export interface RankedType {
  cabinetTypeId: number;
  confidence: number;
  probability: number | null;
  source: "model" | "description";
}

export interface MatterCandidate {
  matterId: number;
  score: number;
  reasons: string[];
}

export interface NewSuggestion {
  documentId: number;
  modelVersionId: number | null;
  method: "model" | "cold_start" | "blended";
  ranked: RankedType[];
  noConfidentMatch: boolean;
  /** The model's confidence in the top type before blending; null without a model. */
  modelConfidence: number | null;
  why: { term: string; weight: number }[];
  matterCandidates: MatterCandidate[];
  topMatterId: number | null;
  matterAmbiguous: boolean;
  autoFile: boolean;
}
