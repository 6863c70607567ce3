import "server-only";
// What the Models screen shows beyond GET /api/models: the current version's cross-validated
// per-class metrics, with cabinet type names in place of the class labels (their ids).
import { can } from "@/lib/auth/permissions";
import { listCabinetTypes } from "@/lib/data/catalog";
import { findCurrentModel, getModelVersion } from "@/lib/data/models";
import type { CurrentUser } from "@/lib/data/users";
import { notAllowed } from "@/lib/errors";

export interface ClassScore {
  cabinetTypeId: number | null;
  name: string;
  precision: number;
  recall: number;
  f1: number;
  support: number;
}

export interface CurrentModelReport {
  versionId: number;
  method: "split" | "k-fold" | null;
  folds: number | null;
  top3Accuracy: number | null;
  weightedF1: number | null;
  perClass: ClassScore[];
}

interface StoredReport {
  method?: "split" | "k-fold";
  folds?: number | null;
  top3Accuracy?: number;
  weightedF1?: number;
  perClass?: { label: string; precision: number; recall: number; f1: number; support: number }[];
}

export async function getCurrentModelReport(user: CurrentUser): Promise<CurrentModelReport | null> {
  if (!can(user.role, "models.read")) throw notAllowed("see model versions");
  const current = await findCurrentModel();
  if (!current) return null;
  const [version, types] = await Promise.all([getModelVersion(user, current.id), listCabinetTypes(user)]);
  const report = (version.metrics ?? {}) as StoredReport;
  const names = new Map(types.map((t) => [String(t.id), t.name]));
  return {
    versionId: version.id,
    method: report.method ?? null,
    folds: report.folds ?? null,
    top3Accuracy: report.top3Accuracy ?? null,
    weightedF1: report.weightedF1 ?? null,
    perClass: (report.perClass ?? []).map((c) => ({
      cabinetTypeId: /^\d+$/.test(c.label) ? Number(c.label) : null,
      name: names.get(c.label) ?? `Cabinet type ${c.label}`,
      precision: c.precision,
      recall: c.recall,
      f1: c.f1,
      support: c.support,
    })),
  };
}
