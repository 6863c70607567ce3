import "server-only";
// Disposal, second half: the second person's decision. Approving re-checks every document under
// row locks (a hold placed after the proposal keeps its documents; a rule changed since so that a
// document is no longer due keeps it too), then in one transaction turns each remaining document
// into a tombstone (text cleared, disposed_at, its batch) and appends its "disposed" filing event.
// Only after that commit are the originals deleted from the bucket: a failure in between leaves a
// tombstone whose original still waits to be removed (approving again retries), never a live row
// without its file.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { deleteTerms } from "@/lib/data/document-terms";
import { getBatch, whyNotApprover, type BatchDetail } from "@/lib/data/disposal-batches";
import { dueOnSql, heldSql } from "@/lib/data/retention-sql";
import { appendFilingEvent } from "@/lib/data/record";
import type { CurrentUser } from "@/lib/data/users";
import { AppError, notAllowed } from "@/lib/errors";
import { utcDay } from "@/lib/records/retention-date";
import { deleteObject } from "@/storage/s3";
import { deletePreviews } from "@/lib/data/preview";

export interface ApprovalResult {
  batch: BatchDetail;
  disposed: number;
  keptHold: number;
  keptNotDue: number;
  /** Originals still in the bucket because the store did not answer; approve again to retry. */
  pendingDeletion: number;
}

type Row = Record<string, unknown>;

// Decisions run in READ COMMITTED: each statement reads what is committed when it runs, so the
// hold check, made once the rows are locked, sees every hold committed before those locks.
const DECISION = { isolationLevel: "read committed" } as const;

async function lockForDecision(trx: Knex.Transaction, user: CurrentUser, batchId: number): Promise<BatchDetail> {
  await trx("disposal_batches").where({ id: batchId }).forUpdate().first("id"); // one decision at a time
  return getBatch(user, batchId, trx); // 404 / 403 through the wall
}

export async function approveBatch(user: CurrentUser, batchId: number, today = utcDay(new Date())): Promise<ApprovalResult> {
  if (user.role !== "admin" && user.role !== "partner") throw notAllowed("approve disposal");
  const db = getDb();
  const counts = await db.transaction(async (trx) => {
    const batch = await lockForDecision(trx, user, batchId);
    if (batch.status === "approved") return null; // only the removal of originals may be retried
    if (batch.status !== "proposed") throw new AppError(409, "already_decided", `Batch #${batchId} was already ${batch.status}. Nothing was changed.`);
    const why = await whyNotApprover(user, batch, trx);
    if (why) throw new AppError(403, batch.proposedById === user.id ? "two_person_rule" : "not_approver", `${why} Nothing was destroyed.`);

    const ids = batch.items.filter((i) => i.outcome === "proposed").map((i) => i.documentId);
    // Lock the documents and every matter they are or were linked to: placing a hold locks the
    // same rows first (lib/data/holds.ts), so a hold and an approval never pass each other.
    const matterIds = await trx("document_matter_links").whereIn("document_id", ids).pluck("matter_id");
    await trx("matters").whereIn("id", [...new Set([...matterIds, ...batch.matters.map((m) => m.id)])]).forUpdate().select("id");
    await trx("documents").whereIn("id", ids).forUpdate().select("id");
    const rows: Row[] = await trx("documents as d")
      .leftJoin("cabinet_types as c", "c.id", "d.cabinet_type_id")
      .leftJoin("matters as m", "m.id", "d.matter_id")
      .whereIn("d.id", ids)
      .whereNull("d.disposed_at")
      .select("d.id", "d.matter_id", "d.cabinet_type_id")
      .select(trx.raw(`${heldSql()} AS held`), trx.raw(`${dueOnSql()} AS due_on`));
    const held = rows.filter((r) => Number(r.held)).map((r) => Number(r.id));
    const notDue = rows.filter((r) => !Number(r.held) && (r.due_on === null || utcDay(r.due_on as string) > today)).map((r) => Number(r.id));
    const go = rows.filter((r) => !held.includes(Number(r.id)) && !notDue.includes(Number(r.id)));
    if (go.length === 0) {
      throw new AppError(409, "nothing_to_dispose", `Nothing in batch #${batchId} can be destroyed now: ${held.length} under a legal hold, ${notDue.length} no longer past the retention date. Nothing was destroyed; reject the batch instead.`);
    }
    const proposer = batch.proposedBy;
    for (const r of go) {
      const item = batch.items.find((i) => i.documentId === Number(r.id))!;
      await trx("documents").where({ id: r.id }).update({ text: null, disposed_at: trx.raw("CURRENT_TIMESTAMP(3)"), disposal_batch_id: batchId });
      // Its term counts tell what the text said: they go with it.
      await deleteTerms(trx, [Number(r.id)]);
      // The "why" terms of a suggestion are words of the text: they go with it.
      await trx("suggestions").where({ document_id: r.id }).update({ why: JSON.stringify([]) });
      await appendFilingEvent(trx, {
        documentId: Number(r.id),
        userId: user.id,
        action: "disposed",
        fromCabinetTypeId: (r.cabinet_type_id as number | null) ?? null,
        fromMatterId: (r.matter_id as number | null) ?? null,
        reason: `Disposal batch #${batchId}: ${item.rule}, due ${item.dueOn}; proposed by ${proposer}, approved by ${user.name}.`,
      });
    }
    const setOutcome = (docIds: number[], outcome: string) =>
      docIds.length ? trx("disposal_batch_items").where({ batch_id: batchId }).whereIn("document_id", docIds).update({ outcome }) : Promise.resolve(0);
    await setOutcome(go.map((r) => Number(r.id)), "disposed");
    await setOutcome(held, "kept_hold");
    await setOutcome(notDue, "kept_not_due");
    await trx("disposal_batches").where({ id: batchId }).update({ status: "approved", decided_by: user.id, decided_at: trx.raw("CURRENT_TIMESTAMP(3)") });
    return { disposed: go.length, keptHold: held.length, keptNotDue: notDue.length };
  }, DECISION);
  if (counts === null) {
    const pending = (await getBatch(user, batchId)).items.filter((i) => i.outcome === "disposed" && !i.objectDeletedAt);
    if (pending.length === 0) throw new AppError(409, "already_decided", `Batch #${batchId} was already approved and carried out. Nothing was changed.`);
  }
  const pendingDeletion = await removeOriginals(batchId);
  const batch = await getBatch(user, batchId);
  const outcome = (o: string) => batch.items.filter((i) => i.outcome === o).length;
  return { batch, disposed: outcome("disposed"), keptHold: outcome("kept_hold"), keptNotDue: outcome("kept_not_due"), pendingDeletion };
}

/** Deletes the originals of the batch's disposed documents that are still in the bucket. */
async function removeOriginals(batchId: number): Promise<number> {
  const db = getDb();
  const rows = await db("disposal_batch_items as i").join("documents as d", "d.id", "i.document_id").where({ "i.batch_id": batchId, "i.outcome": "disposed" }).whereNull("i.object_deleted_at").select("i.document_id", "d.storage_key");
  let pending = 0;
  for (const r of rows) {
    try {
      await deleteObject(r.storage_key); // S3 answers success for a key already gone, so a retry is safe
      await deletePreviews(r.document_id); // the page images go with the original
      await db("disposal_batch_items").where({ batch_id: batchId, document_id: r.document_id }).update({ object_deleted_at: db.raw("CURRENT_TIMESTAMP(3)") });
    } catch (e) {
      console.error(`disposal batch ${batchId}: the original of document ${r.document_id} could not be deleted yet`, e);
      pending++;
    }
  }
  return pending;
}

export async function rejectBatch(user: CurrentUser, batchId: number, reason: string): Promise<BatchDetail> {
  if (user.role !== "admin" && user.role !== "partner") throw notAllowed("reject disposal batches");
  await getDb().transaction(async (trx) => {
    const batch = await lockForDecision(trx, user, batchId);
    if (batch.status !== "proposed") throw new AppError(409, "already_decided", `Batch #${batchId} was already ${batch.status}. Nothing was changed.`);
    // Withdrawing one's own proposal is allowed: only destruction needs a second person.
    const why = batch.proposedById === user.id ? null : await whyNotApprover(user, batch, trx);
    if (why) throw new AppError(403, "not_approver", why.replace("approve", "reject"));
    await trx("disposal_batch_items").where({ batch_id: batchId }).update({ outcome: "rejected" });
    await trx("disposal_batches").where({ id: batchId }).update({ status: "rejected", decided_by: user.id, decided_at: trx.raw("CURRENT_TIMESTAMP(3)"), decision_reason: reason });
  }, DECISION);
  return getBatch(user, batchId);
}
