import "server-only";
// Model versions: training → candidate → current / rejected / retired / failed.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError, notAllowed, notFound } from "@/lib/errors";
import { can } from "@/lib/auth/permissions";
import { enqueueJob } from "@/lib/data/jobs";
import type { CurrentUser } from "@/lib/data/users";

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

/** Model versions for the Models screen and API (admins and auditors; office-wide, no matter names). */
export async function listModelVersions(user: CurrentUser, limit = 100): Promise<ModelVersion[]> {
  if (!can(user.role, "models.read")) throw notAllowed("see model versions");
  return (await versions().orderBy("v.id", "desc").limit(limit)).map((r) => toVersion(r));
}

export async function getModelVersion(user: CurrentUser, id: number): Promise<ModelVersion> {
  if (!can(user.role, "models.read")) throw notAllowed("see model versions");
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
  await getDb().transaction((trx) => promoteInTransaction(trx, id, userId, reason));
}

async function promoteInTransaction(trx: Knex.Transaction, id: number, userId: number | null, reason: string): Promise<void> {
  {
    const row = await trx("model_versions").where({ id }).forUpdate().first("id", "status", "artifact_key");
    if (!row) throw notFound("That model version");
    if (!row.artifact_key || !["candidate", "current", "rejected", "retired"].includes(row.status)) {
      throw new AppError(409, "not_promotable", `Model version #${id} is ${row.status} and has no finished model to serve. Pick a finished version.`);
    }
    await trx("model_versions").where({ status: "current" }).whereNot({ id }).update({ status: "retired" });
    await trx("model_versions").where({ id }).update({ status: "current", promoted_at: trx.fn.now(), promoted_by: userId, reason });
  }
}

/** The job's lease was lost while the results were being written: nothing was written. */
export class LeaseLostError extends Error {
  constructor() {
    super("Another worker took this training job over; its results were not written twice.");
    this.name = "LeaseLostError";
  }
}

/** A queued run's job completion, called inside the results transaction. */
export type CompleteInTransaction = (trx: Knex.Transaction) => Promise<boolean>;

export type TrainingOutcome = { promote: string } | { reject: string } | { fail: string };

/**
 * Writes a run's results, its promotion or rejection, and (for a queued run) the job's
 * completion in ONE transaction: either all of it lands or none, so a run is never recorded
 * without its job done, nor its job done without its results.
 */
export async function finishTrainingRun(
  versionId: number,
  fields: Record<string, unknown>,
  outcome: TrainingOutcome,
  completeJob?: CompleteInTransaction,
): Promise<void> {
  await getDb().transaction(async (trx) => {
    if (completeJob && !(await completeJob(trx))) throw new LeaseLostError();
    if ("fail" in outcome) {
      await trx("model_versions").where({ id: versionId }).update({ ...fields, status: "failed", progress: null, reason: outcome.fail.slice(0, 600) });
      return;
    }
    await trx("model_versions").where({ id: versionId }).update({ ...fields, status: "candidate" });
    if ("promote" in outcome) await promoteInTransaction(trx, versionId, null, outcome.promote);
    else await trx("model_versions").where({ id: versionId }).update({ status: "rejected", reason: outcome.reject.slice(0, 600) });
  });
}

/**
 * A run whose process died without a job to resume it (a start command stopped mid-training)
 * would block every later run: after an hour with no live job it is marked failed.
 */
export async function failAbandonedTrainingRuns(trainJobKind: string): Promise<void> {
  const db = getDb();
  await db("model_versions as v")
    .where("v.status", "training")
    .whereRaw("v.created_at < NOW(3) - INTERVAL 60 MINUTE")
    .whereNotExists((q) =>
      q.select(db.raw("1")).from("jobs as j").where("j.kind", trainJobKind).whereIn("j.status", ["queued", "running"]).whereRaw("JSON_VALUE(j.payload, '$.versionId') = v.id"),
    )
    .update({ "v.status": "failed", "v.progress": null, "v.reason": "The run stopped before finishing (its process ended). The current model kept serving." });
}

/** A new version in "training"; with `jobKind`, its job is queued in the same transaction. */
export async function createTrainingVersion(trigger: ModelVersion["trigger"], userId: number | null, jobKind?: string): Promise<number> {
  return getDb().transaction(async (trx) => {
    const [id] = await trx("model_versions").insert({ trigger, requested_by: userId, status: "training", progress: jobKind ? "Waiting for a worker" : "Starting" });
    if (jobKind) await enqueueJob(jobKind, null, { versionId: id }, trx);
    return Number(id);
  });
}

export async function findTrainingVersion(): Promise<number | null> {
  const busy = await getDb()("model_versions").where({ status: "training" }).first("id");
  return busy ? Number(busy.id) : null;
}

export async function updateModelVersion(id: number, fields: Record<string, unknown>): Promise<void> {
  await getDb()("model_versions").where({ id }).update(fields);
}
