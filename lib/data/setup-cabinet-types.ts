import "server-only";
// Setup of cabinet types: create, change (rename, describe, retention), retire and restore,
// merge one type into another. Every change writes its setup event in the same transaction;
// a merge also writes one "moved" filing event per document, with the reason "merged".
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError, badInput, notFound } from "@/lib/errors";
import { enqueueJob } from "@/lib/data/jobs";
import { appendFilingEvent } from "@/lib/data/record";
import { appendSetupEvent } from "@/lib/data/setup-record";
import { changedFields, isDuplicateKey, parseJson } from "@/lib/data/setup-shared";
import { whereHumanFiled } from "@/lib/data/training-set";
import type { CurrentUser } from "@/lib/data/users";
import { cabinetTypeSchema, type CabinetTypeInput, type CabinetTypePatch, type RetentionTrigger } from "@/lib/validations/setup";

export interface CabinetType {
  id: number;
  name: string;
  description: string;
  keywords: string[];
  retentionYears: number | null;
  retentionTrigger: RetentionTrigger;
  retentionSource: string;
  active: boolean;
}

export interface CabinetTypeWithCounts extends CabinetType {
  /** Documents filed there now, however they were filed. */
  filedCount: number;
  /** Filings a person decided: what the model learns from. */
  humanFiledCount: number;
}

const COLUMNS = ["id", "name", "description", "keywords", "retention_years", "retention_trigger", "retention_source", "active"];

function toType(r: Record<string, unknown>): CabinetType {
  return {
    id: Number(r.id),
    name: String(r.name),
    description: String(r.description),
    keywords: parseJson<string[]>(r.keywords, []),
    retentionYears: r.retention_years === null ? null : Number(r.retention_years),
    retentionTrigger: r.retention_trigger as RetentionTrigger,
    retentionSource: String(r.retention_source),
    active: Boolean(r.active),
  };
}

const toRow = (t: Omit<CabinetType, "id" | "active">) => ({
  name: t.name,
  description: t.description,
  keywords: JSON.stringify(t.keywords),
  retention_years: t.retentionYears,
  retention_trigger: t.retentionTrigger,
  retention_source: t.retentionSource,
});

/** What the record keeps of a type: every field, so before → after reads alone. */
const snapshot = ({ id: _id, ...rest }: CabinetType) => rest; // eslint-disable-line @typescript-eslint/no-unused-vars

export async function listCabinetTypesWithCounts(): Promise<CabinetTypeWithCounts[]> {
  const db = getDb();
  const [types, filed, human] = await Promise.all([
    db("cabinet_types").select(COLUMNS).orderBy("name"),
    db("documents").whereNotNull("filed_at").whereNotNull("cabinet_type_id").groupBy("cabinet_type_id").select("cabinet_type_id").count({ n: "id" }),
    whereHumanFiled(db("documents")).groupBy("cabinet_type_id").select("cabinet_type_id").count({ n: "id" }),
  ]);
  const byType = (rows: { cabinet_type_id: number; n: number | string }[]) => new Map(rows.map((r) => [Number(r.cabinet_type_id), Number(r.n)]));
  const f = byType(filed as never);
  const h = byType(human as never);
  return types.map((r) => {
    const t = toType(r);
    return { ...t, filedCount: f.get(t.id) ?? 0, humanFiledCount: h.get(t.id) ?? 0 };
  });
}

async function findType(db: Knex | Knex.Transaction, id: number, lock = false): Promise<CabinetType> {
  const q = db("cabinet_types").where({ id }).first(COLUMNS);
  const row = await (lock ? q.forUpdate() : q);
  if (!row) throw notFound("That cabinet type");
  return toType(row);
}

export async function getCabinetType(id: number): Promise<CabinetType> {
  return findType(getDb(), id);
}

async function refuseDuplicateName(db: Knex | Knex.Transaction, name: string, exceptId?: number): Promise<void> {
  const q = db("cabinet_types").where({ name }).first("id", "name", "active");
  if (exceptId) q.whereNot({ id: exceptId });
  const other = await q;
  if (other) throw duplicateName(other.name, Boolean(other.active));
}

const duplicateName = (name: string, active = true) =>
  new AppError(409, "duplicate_name", `A cabinet type named "${name}" already exists${active ? "" : " (retired: restore it instead)"}. Choose another name.`);

/**
 * Documents waiting in To review whose latest suggestion puts a just-retired type on top are
 * suggested again (in the caller's transaction), so the queue never offers a retired type first.
 */
async function resuggestAfterRetire(trx: Knex.Transaction, typeId: number): Promise<number> {
  const ids: number[] = await trx("documents as d")
    .join("suggestions as s", "s.document_id", "d.id")
    .where("d.status", "ready")
    .whereNull("d.filed_at")
    .where("s.top_cabinet_type_id", typeId)
    .whereRaw("s.id = (SELECT MAX(s2.id) FROM suggestions s2 WHERE s2.document_id = d.id)")
    .distinct()
    .pluck("d.id");
  for (const id of ids) await enqueueJob("suggest", id, null, trx);
  return ids.length;
}

export async function createCabinetType(user: CurrentUser, input: CabinetTypeInput): Promise<CabinetType> {
  const db = getDb();
  try {
    return await db.transaction(async (trx) => {
      await refuseDuplicateName(trx, input.name);
      const [id] = await trx("cabinet_types").insert({ ...toRow(input), active: true });
      const created = await findType(trx, Number(id));
      await appendSetupEvent(trx, { userId: user.id, entity: "cabinet_type", entityId: created.id, action: "created", after: snapshot(created) });
      return created;
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateName(input.name);
    throw e;
  }
}

/** The setup action a patch amounts to: retiring and restoring are their own events. */
function actionOf(before: CabinetType, after: CabinetType): string {
  if (before.active && !after.active) return "retired";
  if (!before.active && after.active) return "restored";
  if (before.name !== after.name) return "renamed";
  return "changed";
}

export async function updateCabinetType(user: CurrentUser, id: number, patch: CabinetTypePatch): Promise<CabinetType> {
  const db = getDb();
  try {
    return await db.transaction(async (trx) => {
      const before = await findType(trx, id, true);
      const merged = { ...before, ...patch };
      // A permanent type has no years; switching to permanent drops them without asking twice.
      if (patch.retentionTrigger === "permanent" && patch.retentionYears === undefined) merged.retentionYears = null;
      const checked = cabinetTypeSchema.parse(merged);
      if (checked.name !== before.name) await refuseDuplicateName(trx, checked.name, id);
      const after: CabinetType = { ...checked, id, active: merged.active };
      const diff = changedFields(snapshot(before), snapshot(after));
      if (Object.keys(diff.after).length === 0) return before;
      await trx("cabinet_types").where({ id }).update({ ...toRow(after), active: after.active, updated_at: trx.fn.now() });
      if (before.active && !after.active) await resuggestAfterRetire(trx, id);
      // Before and after carry the name each side had, so the record reads right after a rename.
      await appendSetupEvent(trx, {
        userId: user.id,
        entity: "cabinet_type",
        entityId: id,
        action: actionOf(before, after),
        before: { name: before.name, ...diff.before },
        after: { name: after.name, ...diff.after },
      });
      return after;
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateName(patch.name ?? "");
    throw e;
  }
}

export interface MergeResult {
  from: CabinetType;
  into: CabinetType;
  movedDocuments: number;
}

/**
 * Moves every document filed in `id` to `intoId` (one "moved" filing event each, reason
 * "merged"), then retires `id`. All in one transaction: a failure moves nothing.
 */
export async function mergeCabinetType(user: CurrentUser, id: number, intoId: number): Promise<MergeResult> {
  if (id === intoId) throw badInput("A cabinet type cannot be merged into itself. Choose another type to merge into.");
  return getDb().transaction(async (trx) => {
    const from = await findType(trx, id, true);
    const into = await findType(trx, intoId, true).catch(() => {
      throw badInput("The cabinet type to merge into does not exist. Choose one from the list.");
    });
    if (!into.active) throw badInput(`"${into.name}" is retired. Restore it first, or merge into an active type.`);
    const documents: { id: number; matter_id: number | null }[] = await trx("documents").where({ cabinet_type_id: id }).whereNotNull("filed_at").forUpdate().select("id", "matter_id");
    for (const d of documents) {
      await trx("documents").where({ id: d.id }).update({ cabinet_type_id: intoId });
      await appendFilingEvent(trx, {
        documentId: d.id,
        userId: user.id,
        action: "moved",
        fromCabinetTypeId: id,
        toCabinetTypeId: intoId,
        fromMatterId: d.matter_id,
        toMatterId: d.matter_id,
        reason: "merged",
      });
    }
    if (from.active) await trx("cabinet_types").where({ id }).update({ active: false, updated_at: trx.fn.now() });
    await resuggestAfterRetire(trx, id);
    await appendSetupEvent(trx, {
      userId: user.id,
      entity: "cabinet_type",
      entityId: id,
      action: "merged",
      before: { name: from.name, active: from.active },
      after: { name: from.name, active: false, mergedIntoId: into.id, mergedInto: into.name, movedDocuments: documents.length },
    });
    return { from: { ...from, active: false }, into, movedDocuments: documents.length };
  });
}
