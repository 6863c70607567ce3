import type { ModelStatus, ModelVersion } from "@/lib/data/models";
import type { OfficeSettings } from "@/lib/data/settings";

export type { ModelStatus, ModelVersion, OfficeSettings };

/** The answer of GET /api/models. */
export interface ModelsOverview {
  versions: ModelVersion[];
  current: number | null;
  training: ModelVersion | null;
  settings: OfficeSettings;
}

export const STATUS_WORDS: Record<ModelStatus, string> = {
  training: "Training",
  candidate: "Candidate",
  current: "Current",
  rejected: "Not promoted",
  retired: "Retired",
  failed: "Failed",
};

export function triggerWords(v: Pick<ModelVersion, "trigger" | "requestedBy">): string {
  if (v.trigger === "nightly") return "nightly run";
  if (v.trigger === "start") return "first start";
  return v.requestedBy ? `by ${v.requestedBy}` : "by hand";
}

/** A finished version with a stored model can be made current (a promotion or a roll-back). */
export function canBecomeCurrent(v: ModelVersion): boolean {
  return (v.status === "candidate" || v.status === "rejected" || v.status === "retired") && v.artifactBytes !== null;
}

export const formatF1 = (v: number | null) => (v === null ? "–" : v.toFixed(3));
