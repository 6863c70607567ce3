import "server-only";
// Model versions: training → candidate → current / rejected / retired / failed.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError, notFound } from "@/lib/errors";

export type ModelStatus = "training" | "candidate" | "current" | "rejected" | "retired" | "failed";

export interface ModelVersion {
  id: number;
  status: ModelStatus;
  trigger: "nightly" | "manual" | "start";
  requestedBy: string | null;
  trainCount: number | null;
  vocabularySize: number | null;
  classCount: number | null;
  macroF1: number | null;
  accuracy: number | null;
  comparedMacroF1: number | null;
  autoFileThreshold: number | null;
  autoFileShare: number | null;
  autoFileTarget: number | null;
  durationMs: number | null;
  artifactBytes: number | null;
  progress: string | null;
  reason: string | null;
  createdAt: string;
  finishedAt: string | null;
  promotedAt: string | null;
  metrics: unknown;
}

const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));
const parse = (v: unknown) => (typeof v === "string" ? JSON.parse(v) : v ?? null);

function toVersion(r: Record<string, unknown>, withMetrics = false): ModelVersion {
  const classes = parse(r.class_list) as unknown[] | null;
  return {
    id: Number(r.id),
    status: r.status as ModelStatus,
    trigger: r.trigger as ModelVersion["trigger"],
    requestedBy: (r.requester as string | null) ?? null,
    trainCount: num(r.train_count),
    vocabularySize: num(r.vocabulary_size),
    classCount: classes ? classes.length : null,
    macroF1: num(r.macro_f1),
    accuracy: num(r.accuracy),
    comparedMacroF1: num(r.compared_macro_f1),
    autoFileThreshold: num(r.autofile_threshold),
    autoFileShare: num(r.autofile_share),
    autoFileTarget: num(r.autofile_target),
    durationMs: num(r.duration_ms),
    artifactBytes: num(r.artifact_bytes),
    progress: (r.progress as string | null) ?? null,
    reason: (r.reason as string | null) ?? null,
    createdAt: new Date(r.created_at as string).toISOString(),
    finishedAt: r.finished_at ? new Date(r.finished_at as string).toISOString() : null,
    promotedAt: r.promoted_at ? new Date(r.promoted_at as string).toISOString() : null,
    metrics: withMetrics ? parse(r.metrics) : undefined,
  };
}

function versions(db: Knex = getDb()) {
  return db("model_versions as v").leftJoin("users as u", "u.id", "v.requested_by").select("v.*", "u.name as requester");
}

export async function listModelVersions(limit = 100): Promise<ModelVersion[]> {
  return (await versions().orderBy("v.id", "desc").limit(limit)).map((r) => toVersion(r));
}

export async function getModelVersion(id: number): Promise<ModelVersion> {
  const r = await versions().where("v.id", id).first();
  if (!r) throw notFound("That model version");
  return toVersion(r, true);
}

export interface CurrentModelRow {
  id: number;
  artifactKey: string;
  classList: number[];
  autoFileThreshold: number | null;
}

export async function findCurrentModel(): Promise<CurrentModelRow | null> {
  const r = await getDb()("model_versions").where({ status: "current" }).orderBy("id", "desc").first("id", "artifact_key", "class_list", "autofile_threshold");
  if (!r) return null;
  return { id: r.id, artifactKey: r.artifact_key, classList: parse(r.class_list), autoFileThreshold: num(r.autofile_threshold) };
}

export async function findCurrentModelParams(): Promise<{ id: number; params: Record<string, unknown> } | null> {
  const r = await getDb()("model_versions").where({ status: "current" }).orderBy("id", "desc").first("id", "params");
  return r ? { id: r.id, params: parse(r.params) ?? {} } : null;
}

/** Makes `id` the current version (a candidate, or an older one for a rollback). */
export async function promoteModelVersion(id: number, userId: number | null, reason: string): Promise<void> {
  await getDb().transaction(async (trx) => {
    const row = await trx("model_versions").where({ id }).forUpdate().first("id", "status", "artifact_key");
    if (!row) throw notFound("That model version");
    if (!row.artifact_key || !["candidate", "current", "rejected", "retired"].includes(row.status)) {
      throw new AppError(409, "not_promotable", `Model version #${id} is ${row.status} and has no finished model to serve. Pick a finished version.`);
    }
    await trx("model_versions").where({ status: "current" }).whereNot({ id }).update({ status: "retired" });
    await trx("model_versions").where({ id }).update({ status: "current", promoted_at: trx.fn.now(), promoted_by: userId, reason });
  });
}

export async function updateModelVersion(id: number, fields: Record<string, unknown>): Promise<void> {
  await getDb()("model_versions").where({ id }).update(fields);
}
