import "server-only";
// Disposal batches as the screens and the certificate read them. A batch is visible only to
// someone who may see every document in it (admins see all), so a batch never shows a restricted
// matter's names or counts to someone outside its team.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { whereDocumentWalled } from "@/lib/data/document-access";
import type { CurrentUser } from "@/lib/data/users";
import { AppError, notFound } from "@/lib/errors";
import { describeRule, utcDay, type RetentionTrigger } from "@/lib/records/retention-date";
import type { CertificateItem } from "@/lib/records/certificate-types";
import { heldSql } from "@/lib/data/retention-sql";

export type BatchStatus = "proposed" | "approved" | "rejected";
export type ItemOutcome = "proposed" | "disposed" | "kept_hold" | "kept_not_due" | "rejected";

export interface BatchSummary {
  id: number;
  status: BatchStatus;
  note: string;
  proposedBy: string;
  proposedById: number;
  proposedAt: string;
  decidedBy: string | null;
  decidedAt: string | null;
  decisionReason: string | null;
  documents: number;
  disposed: number;
}

/** A certificate's line for one document, with its outcome in the batch and whether it is held now. */
export interface BatchItem extends Omit<CertificateItem, "outcome"> {
  outcome: ItemOutcome;
  heldNow: boolean;
}

export interface BatchDetail extends BatchSummary {
  items: BatchItem[];
  /** The matters of the batch's documents (a partner must be on each to approve). */
  matters: { id: number; number: string }[];
}

type Db = Knex | Knex.Transaction;
type Row = Record<string, unknown>;
const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : null);

export function visibleBatches(db: Db, user: CurrentUser) {
  return db("disposal_batches as b").whereNotExists((sub) =>
    whereDocumentWalled(sub.select(db.raw("1")).from("disposal_batch_items as wbi").join("documents as d", "d.id", "wbi.document_id").whereRaw("wbi.batch_id = b.id"), user, "d"),
  );
}

function summaries(db: Db, user: CurrentUser) {
  return visibleBatches(db, user)
    .join("users as pu", "pu.id", "b.proposed_by")
    .leftJoin("users as du", "du.id", "b.decided_by")
    .select("b.*", "pu.name as proposer", "du.name as decider")
    .select(db.raw("(SELECT COUNT(*) FROM disposal_batch_items ci WHERE ci.batch_id = b.id) AS n"))
    .select(db.raw("(SELECT COUNT(*) FROM disposal_batch_items ci WHERE ci.batch_id = b.id AND ci.outcome = 'disposed') AS n_disposed"));
}

const toSummary = (r: Row): BatchSummary => ({
  id: Number(r.id),
  status: r.status as BatchStatus,
  note: String(r.note),
  proposedBy: String(r.proposer),
  proposedById: Number(r.proposed_by),
  proposedAt: iso(r.proposed_at)!,
  decidedBy: (r.decider as string | null) ?? null,
  decidedAt: iso(r.decided_at),
  decisionReason: (r.decision_reason as string | null) ?? null,
  documents: Number(r.n),
  disposed: Number(r.n_disposed),
});

export async function listBatches(user: CurrentUser, f: { status?: BatchStatus; page: number; pageSize: number }): Promise<{ items: BatchSummary[]; total: number }> {
  const db = getDb();
  const q = summaries(db, user);
  if (f.status) q.where("b.status", f.status);
  const [{ total }] = await visibleBatches(db, user).modify((b) => (f.status ? b.where("b.status", f.status) : b)).count({ total: "b.id" });
  const rows = await q.orderBy("b.id", "desc").limit(f.pageSize).offset((f.page - 1) * f.pageSize);
  return { items: rows.map(toSummary), total: Number(total) };
}

/** 404 for no such batch, 403 for one that holds a document the user may not see. */
export async function missingOrWalledBatch(db: Db, id: number): Promise<AppError> {
  if (!(await db("disposal_batches").where({ id }).first("id"))) return notFound("That disposal batch");
  return new AppError(403, "restricted_matter", "This batch includes documents of a restricted matter you are not on. Ask an admin.");
}

export async function getBatch(user: CurrentUser, id: number, db: Db = getDb()): Promise<BatchDetail> {
  const r = await summaries(db, user).where("b.id", id).first();
  if (!r) throw await missingOrWalledBatch(db, id);
  const items = await db("disposal_batch_items as i")
    .join("documents as d", "d.id", "i.document_id")
    .leftJoin("matters as m", "m.id", "d.matter_id")
    .leftJoin("cabinet_types as c", "c.id", "d.cabinet_type_id")
    .where("i.batch_id", id)
    .orderBy("i.document_id")
    .select("i.*", "d.original_name", "d.sha256", "d.uploaded_at", "d.filed_at", "d.disposed_at", "d.matter_id", "m.number", "c.name as type_name")
    .select(db.raw(`${heldSql("d")} AS held`));
  const matters = new Map<number, string>();
  for (const it of items) if (it.matter_id) matters.set(Number(it.matter_id), String(it.number));
  return {
    ...toSummary(r),
    matters: [...matters].map(([mid, number]) => ({ id: mid, number })),
    items: items.map((i: Row) => ({
      documentId: Number(i.document_id),
      name: String(i.original_name),
      sha256: String(i.sha256),
      matter: (i.number as string | null) ?? null,
      cabinetType: (i.type_name as string | null) ?? null,
      uploadedAt: iso(i.uploaded_at)!,
      filedAt: iso(i.filed_at),
      dueOn: utcDay(i.due_on as string),
      rule: describeRule({ years: i.retention_years === null ? null : Number(i.retention_years), trigger: i.retention_trigger as RetentionTrigger }),
      ruleSource: String(i.retention_source),
      outcome: i.outcome as ItemOutcome,
      heldNow: Boolean(Number(i.held)),
      disposedAt: iso(i.disposed_at),
      objectDeletedAt: iso(i.object_deleted_at),
    })),
  };
}

/** Why this user may not approve the batch, or null when they may (the two-person rule first). */
export async function whyNotApprover(user: CurrentUser, batch: { proposedById: number; matters: { id: number; number: string }[]; items: { matter: string | null }[] }, db: Db = getDb()): Promise<string | null> {
  if (batch.proposedById === user.id) {
    return "You proposed this batch, so you cannot approve it: a partner on each matter involved, or another admin, must approve it.";
  }
  if (user.role === "admin") return null;
  if (user.role !== "partner") return "Only a partner on each matter involved, or an admin other than the proposer, can approve a disposal batch.";
  if (batch.items.some((i) => i.matter === null)) return "This batch includes documents filed in no matter, so only an admin other than the proposer can approve it.";
  const mine = new Set((await db("matter_members").where({ user_id: user.id }).whereIn("matter_id", batch.matters.map((m) => m.id)).pluck("matter_id")).map(Number));
  const notOn = batch.matters.filter((m) => !mine.has(m.id)).map((m) => m.number);
  if (notOn.length) return `You are not on matter ${notOn.join(", ")}, so you cannot approve this batch. A partner on every matter involved, or an admin other than the proposer, must approve it.`;
  return null;
}

/** The batch that destroyed this document (the caller has checked the user may see the document). */
export async function findDisposalOf(documentId: number): Promise<{ batchId: number; proposedBy: string; approvedBy: string | null } | null> {
  const r = await getDb()("documents as d")
    .join("disposal_batches as b", "b.id", "d.disposal_batch_id")
    .join("users as pu", "pu.id", "b.proposed_by")
    .leftJoin("users as du", "du.id", "b.decided_by")
    .where("d.id", documentId)
    .first("b.id", "pu.name as proposer", "du.name as approver");
  return r ? { batchId: Number(r.id), proposedBy: String(r.proposer), approvedBy: (r.approver as string | null) ?? null } : null;
}
