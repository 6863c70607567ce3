// The model this process serves. Every few seconds it asks the database which version is
// current, so every app instance picks up a promotion or a rollback without a restart.
import { findCurrentModel } from "@/lib/data/models";
import { loadModel, type FoldwrightModel } from "@/lib/ml";
import { getObjectBytes } from "@/storage/s3";

export interface ServingModel {
  versionId: number;
  model: FoldwrightModel;
  autoFileThreshold: number | null;
}

const CHECK_EVERY_MS = 5_000;
const state = globalThis as unknown as { foldwrightServing?: { model: ServingModel | null; checkedAt: number } };

export async function getServingModel(now = Date.now()): Promise<ServingModel | null> {
  const cached = state.foldwrightServing;
  if (cached && now - cached.checkedAt < CHECK_EVERY_MS) return cached.model;
  const row = await findCurrentModel();
  let model: ServingModel | null = null;
  if (row && cached?.model?.versionId === row.id) model = cached.model;
  else if (row) {
    const loaded = loadModel(new Uint8Array(await getObjectBytes(row.artifactKey)));
    model = { versionId: row.id, model: loaded, autoFileThreshold: row.autoFileThreshold };
  }
  state.foldwrightServing = { model, checkedAt: now };
  return model;
}

/** Forget the cached model (tests, and right after a promotion in this process). */
export function forgetServingModel(): void {
  state.foldwrightServing = undefined;
}
