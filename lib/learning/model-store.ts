// The model this process serves. Each use asks the database which version is current (one
// indexed row) and loads the artifact only when that changed, so every app instance serves a
// promotion or a rollback from its next suggestion on, without a restart.
import { findCurrentModel } from "@/lib/data/models";
import { loadModel, type FoldwrightModel } from "@/lib/ml";
import { getObjectBytes } from "@/storage/s3";

export interface ServingModel {
  versionId: number;
  model: FoldwrightModel;
  autoFileThreshold: number | null;
}

const state = globalThis as unknown as { foldwrightServing?: { model: ServingModel | null } };

export async function getServingModel(): Promise<ServingModel | null> {
  const cached = state.foldwrightServing;
  const row = await findCurrentModel();
  let model: ServingModel | null = null;
  if (row && cached?.model?.versionId === row.id) model = cached.model;
  else if (row) {
    const loaded = loadModel(new Uint8Array(await getObjectBytes(row.artifactKey)));
    model = { versionId: row.id, model: loaded, autoFileThreshold: row.autoFileThreshold };
  }
  state.foldwrightServing = { model };
  return model;
}

/** Forget the cached model (tests, and right after a promotion in this process). */
export function forgetServingModel(): void {
  state.foldwrightServing = undefined;
}
