import "server-only";
// Disposal, first half: the due list (filed, past the retention date, not held, not destroyed)
// and an admin's proposal of a batch. Nothing is destroyed here; lib/data/disposal-decide.ts
// does that after a second person approves. Everything goes through the ethical wall.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { whereDocumentVisible } from "@/lib/data/document-access";
import { dueOnSql, heldSql } from "@/lib/data/retention-sql";
import type { CurrentUser } from "@/lib/data/users";
import { AppError, notAllowed } from "@/lib/errors";
import { describeRule, utcDay, type RetentionTrigger } from "@/lib/records/retention-date";

export interface DueDocument {
  id: number;
  name: string;
  matter: string | null;
  cabinetType: string;
  filedAt: string;
  dueOn: string;
  rule: string;
  /** An open (proposed) batch this document is already in. */
  inBatchId: number | null;
}

type Db = Knex | Knex.Transaction;
type Row = Record<string, unknown>;

/** Documents with their cabinet type and matter, retention date and hold state, through the wall. */
export function retentionDocuments(db: Db, user: CurrentUser) {
  const q = db("documents as d")
    .join("cabinet_types as c", "c.id", "d.cabinet_type_id")
    .leftJoin("matters as m", "m.id", "d.matter_id")
    .whereNotNull("d.filed_at")
    .whereNull("d.disposed_at");
  return whereDocumentVisible(q, user, "d");
}

const OPEN_BATCH_SQL = `(SELECT MAX(obi.batch_id) FROM disposal_batch_items obi JOIN disposal_batches ob ON ob.id = obi.batch_id
  WHERE obi.document_id = d.id AND ob.status = 'proposed')`;

export async function listDue(user: CurrentUser, f: { page: number; pageSize: number }, today = utcDay(new Date())): Promise<{ items: DueDocument[]; total: number }> {
  const db = getDb();
  const q = retentionDocuments(db, user).whereRaw(`${dueOnSql()} <= ?`, [today]).whereRaw(`NOT ${heldSql()}`);
  const [{ total }] = await q.clone().count({ total: "d.id" });
  const rows = await q
    .select("d.id", "d.original_name", "m.number", "c.name as type_name", "c.retention_years", "c.retention_trigger", "d.filed_at")
    .select(db.raw(`${dueOnSql()} AS due_on`), db.raw(`${OPEN_BATCH_SQL} AS in_batch`))
    .orderByRaw("due_on ASC, d.id ASC")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  return {
    total: Number(total),
    items: rows.map((r: Row) => ({
      id: Number(r.id),
      name: String(r.original_name),
      matter: (r.number as string | null) ?? null,
      cabinetType: String(r.type_name),
      filedAt: new Date(r.filed_at as string).toISOString(),
      dueOn: utcDay(r.due_on as string),
      rule: describeRule({ years: r.retention_years === null ? null : Number(r.retention_years), trigger: r.retention_trigger as RetentionTrigger }),
      inBatchId: r.in_batch === null ? null : Number(r.in_batch),
    })),
  };
}

function listIds(ids: number[]): string {
  return ids.map((id) => `#${id}`).join(", ");
}

/** An admin proposes a batch; every document must be due, unheld and in no other open batch. */
export async function proposeBatch(user: CurrentUser, input: { documentIds: number[]; note: string }, today = utcDay(new Date())): Promise<number> {
  if (user.role !== "admin") throw notAllowed("propose a disposal batch");
  const ids = [...new Set(input.documentIds)];
  return getDb().transaction(async (trx) => {
    await trx("documents").whereIn("id", ids).forUpdate().select("id"); // one proposal of a document at a time
    const rows = await retentionDocuments(trx, user)
      .whereIn("d.id", ids)
      .select("d.id", "c.retention_years", "c.retention_trigger", "c.retention_source")
      .select(trx.raw(`${dueOnSql()} AS due_on`), trx.raw(`${heldSql()} AS held`), trx.raw(`${OPEN_BATCH_SQL} AS in_batch`));
    const found = new Map(rows.map((r: Row) => [Number(r.id), r]));
    const problems: string[] = [];
    const missing = ids.filter((id) => !found.has(id));
    if (missing.length) problems.push(`${listIds(missing)} ${missing.length === 1 ? "is" : "are"} not a filed document still kept (never filed, already destroyed, or not there)`);
    const held = rows.filter((r: Row) => Number(r.held)).map((r: Row) => Number(r.id));
    if (held.length) problems.push(`${listIds(held)} ${held.length === 1 ? "is" : "are"} under a legal hold`);
    const notDue = rows.filter((r: Row) => !Number(r.held) && (r.due_on === null || utcDay(r.due_on as string) > today)).map((r: Row) => Number(r.id));
    if (notDue.length) problems.push(`${listIds(notDue)} ${notDue.length === 1 ? "is" : "are"} not past the retention date`);
    const inBatch = rows.filter((r: Row) => r.in_batch !== null).map((r: Row) => `#${r.id} (batch #${r.in_batch})`);
    if (inBatch.length) problems.push(`${inBatch.join(", ")} already wait in a proposed batch`);
    if (problems.length) throw new AppError(409, "not_disposable", `Nothing was proposed: ${problems.join("; ")}. Take them out and propose the rest again.`);

    const [batchId] = await trx("disposal_batches").insert({ note: input.note, proposed_by: user.id });
    await trx("disposal_batch_items").insert(
      rows.map((r: Row) => ({
        batch_id: batchId,
        document_id: r.id,
        retention_years: r.retention_years,
        retention_trigger: r.retention_trigger,
        retention_source: r.retention_source,
        due_on: utcDay(r.due_on as string),
      })),
    );
    return Number(batchId);
  }, { isolationLevel: "read committed" });
}
