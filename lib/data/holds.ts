import "server-only";
// Legal holds: placed and lifted by a partner on the matter or an admin, each act an
// append-only hold event (this module is the only writer of legal_holds and hold_events), listed
// through the ethical wall. Whether a document is held is heldSql (lib/data/retention-sql.ts).
import type { Knex } from "knex";
import { getDb } from "@/db";
import { whereDocumentVisible, whereMatterVisible } from "@/lib/data/document-access";
import type { CurrentUser } from "@/lib/data/users";
import { AppError, notFound } from "@/lib/errors";

export interface HoldView {
  id: number;
  scope: "matter" | "document";
  matterId: number | null;
  matter: string | null; // the matter's number (of the document's matter for a document hold)
  matterTitle: string | null;
  documentId: number | null;
  documentName: string | null;
  reason: string;
  reference: string;
  placedBy: string;
  placedAt: string;
  releasedBy: string | null;
  releasedAt: string | null;
  releaseReason: string | null;
}

type Db = Knex | Knex.Transaction;
type Row = Record<string, unknown>;
const iso = (v: unknown) => (v ? new Date(v as string).toISOString() : null);

function holds(db: Db) {
  return db("legal_holds as h")
    .leftJoin("documents as d", "d.id", "h.document_id")
    .leftJoin("matters as m", "m.id", db.raw("COALESCE(h.matter_id, d.matter_id)"))
    .join("users as pu", "pu.id", "h.placed_by")
    .leftJoin("users as ru", "ru.id", "h.released_by")
    .select("h.*", "m.number", "m.title", "d.original_name", "pu.name as placer", "ru.name as releaser");
}

/** Holds the user may know of: on matters they may see, on documents they may see. */
function visibleHolds(db: Db, user: CurrentUser) {
  return holds(db).where((w) =>
    w
      .where((a) => whereMatterVisible(a.whereNotNull("h.matter_id"), user, "m"))
      .orWhere((b) => whereDocumentVisible(b.whereNotNull("h.document_id"), user, "d")),
  );
}

const toView = (r: Row): HoldView => ({
  id: Number(r.id),
  scope: r.document_id ? "document" : "matter",
  matterId: r.matter_id === null ? null : Number(r.matter_id),
  matter: (r.number as string | null) ?? null,
  matterTitle: (r.title as string | null) ?? null,
  documentId: r.document_id === null ? null : Number(r.document_id),
  documentName: (r.original_name as string | null) ?? null,
  reason: String(r.reason),
  reference: String(r.reference),
  placedBy: String(r.placer),
  placedAt: iso(r.placed_at)!,
  releasedBy: (r.releaser as string | null) ?? null,
  releasedAt: iso(r.released_at),
  releaseReason: (r.release_reason as string | null) ?? null,
});

export async function listHolds(user: CurrentUser, f: { status: "active" | "released" | "all"; page: number; pageSize: number }): Promise<{ items: HoldView[]; total: number }> {
  const q = visibleHolds(getDb(), user);
  if (f.status === "active") q.whereNull("h.released_at");
  if (f.status === "released") q.whereNotNull("h.released_at");
  const [{ total }] = await q.clone().clearSelect().count({ total: "h.id" });
  const rows = await q.orderBy("h.id", "desc").limit(f.pageSize).offset((f.page - 1) * f.pageSize);
  return { items: rows.map(toView), total: Number(total) };
}

/** The active holds that keep this document (the caller has checked the user may see it). */
export async function listHoldsOnDocument(documentId: number): Promise<HoldView[]> {
  const db = getDb();
  const rows = await holds(db)
    .whereNull("h.released_at")
    .where((w) =>
      w
        .where("h.document_id", documentId)
        .orWhereIn("h.matter_id", db("documents").where({ id: documentId }).whereNotNull("matter_id").select("matter_id"))
        .orWhereIn("h.matter_id", db("document_matter_links").where({ document_id: documentId }).select("matter_id")),
    )
    .orderBy("h.id");
  return rows.map(toView);
}

async function isOnMatter(db: Db, user: CurrentUser, matterId: number | null): Promise<boolean> {
  if (matterId === null) return false;
  return Boolean(await db("matter_members").where({ matter_id: matterId, user_id: user.id }).first("user_id"));
}

/** Admins, or partners on the matter: the roles DESIGN §2 gives holds. */
async function assertMayHold(db: Db, user: CurrentUser, matterId: number | null, matterNumber: string | null, verb: string): Promise<void> {
  if (user.role === "admin") return;
  if (user.role === "partner" && (await isOnMatter(db, user, matterId))) return;
  if (matterId === null) throw new AppError(403, "admin_only", `This document is not filed in a matter, so only an admin can ${verb} a hold on it.`);
  throw new AppError(403, "not_on_matter", `Only a partner on matter ${matterNumber} or an admin can ${verb} a hold on it. Ask the matter's partner or an admin.`);
}

async function lockTarget(trx: Knex.Transaction, user: CurrentUser, t: { matterId?: number; documentId?: number }) {
  // Lock the target row alone: a FOR UPDATE over a join also locks the joined rows, in an order
  // that could deadlock with an approval (which locks matters, then documents).
  if (t.documentId !== undefined) {
    await trx("documents").where({ id: t.documentId }).forUpdate().first("id");
    const doc = await whereDocumentVisible(trx("documents as d").leftJoin("matters as m", "m.id", "d.matter_id").where("d.id", t.documentId), user).first("d.id", "d.matter_id", "d.disposed_at", "m.number");
    if (!doc) {
      if (await trx("documents").where({ id: t.documentId }).first("id")) throw new AppError(403, "restricted_matter", "This document is in a restricted matter you are not on. Ask an admin or the matter's partner.");
      throw notFound("That document");
    }
    if (doc.disposed_at) throw new AppError(409, "disposed", "This document was already destroyed under an approved disposal; there is nothing left to hold.");
    return { matterId: doc.matter_id as number | null, number: doc.number as string | null };
  }
  await trx("matters").where({ id: t.matterId! }).forUpdate().first("id");
  const matter = await whereMatterVisible(trx("matters as m").where("m.id", t.matterId!), user, "m").first("m.id", "m.number");
  if (!matter) throw notFound("That matter");
  return { matterId: matter.id as number, number: matter.number as string };
}

export async function placeHold(user: CurrentUser, input: { matterId?: number; documentId?: number; reason: string; reference: string }): Promise<HoldView> {
  const id = await getDb().transaction(async (trx) => {
    // Locking the matter or document row first orders this against a disposal approval, which
    // locks the same rows before it checks for holds (lib/data/disposal-decide.ts).
    const target = await lockTarget(trx, user, input);
    await assertMayHold(trx, user, target.matterId, target.number, "place");
    const existing = await trx("legal_holds")
      .whereNull("released_at")
      .where(input.documentId !== undefined ? { document_id: input.documentId } : { matter_id: input.matterId })
      .first("id");
    if (existing) throw new AppError(409, "already_held", `This ${input.documentId !== undefined ? "document" : "matter"} is already under hold #${existing.id}. Lift that one first if the reason or reference changed.`);
    const [holdId] = await trx("legal_holds").insert({
      matter_id: input.matterId ?? null,
      document_id: input.documentId ?? null,
      reason: input.reason,
      reference: input.reference,
      placed_by: user.id,
    });
    await trx("hold_events").insert({ hold_id: holdId, action: "placed", user_id: user.id, reason: input.reason, reference: input.reference });
    return Number(holdId);
  }, { isolationLevel: "read committed" });
  return (await listHoldById(id))!;
}

export async function releaseHold(user: CurrentUser, holdId: number, reason: string): Promise<HoldView> {
  await getDb().transaction(async (trx) => {
    await trx("legal_holds").where({ id: holdId }).forUpdate().first("id");
    const hold = await visibleHolds(trx, user).where("h.id", holdId).first();
    if (!hold) throw notFound("That hold");
    if (hold.released_at) throw new AppError(409, "already_released", `Hold #${holdId} was already lifted by ${hold.releaser}. Nothing was changed.`);
    const matterId = (hold.matter_id ?? (await trx("documents").where({ id: hold.document_id }).first("matter_id"))?.matter_id ?? null) as number | null;
    await assertMayHold(trx, user, matterId, (hold.number as string | null) ?? null, "lift");
    await trx("legal_holds").where({ id: holdId }).update({ released_by: user.id, released_at: trx.raw("CURRENT_TIMESTAMP(3)"), release_reason: reason });
    await trx("hold_events").insert({ hold_id: holdId, action: "released", user_id: user.id, reason, reference: hold.reference });
  }, { isolationLevel: "read committed" });
  return (await listHoldById(holdId))!;
}

async function listHoldById(id: number): Promise<HoldView | null> {
  const r = await holds(getDb()).where("h.id", id).first();
  return r ? toView(r) : null;
}

export interface HoldEventView {
  id: number;
  holdId: number;
  action: "placed" | "released";
  user: string;
  reason: string;
  reference: string | null;
  at: string;
}

/** The record of places and lifts, for the holds the user may know of. */
export async function listHoldEvents(user: CurrentUser, limit = 200): Promise<HoldEventView[]> {
  const db = getDb();
  const ids = visibleHolds(db, user).clearSelect().select("h.id");
  const rows = await db("hold_events as e").join("users as u", "u.id", "e.user_id").whereIn("e.hold_id", ids).orderBy("e.id", "desc").limit(limit).select("e.*", "u.name as user_name");
  return rows.map((r: Row) => ({
    id: Number(r.id),
    holdId: Number(r.hold_id),
    action: r.action as HoldEventView["action"],
    user: String(r.user_name),
    reason: String(r.reason),
    reference: (r.reference as string | null) ?? null,
    at: iso(r.created_at)!,
  }));
}

/** The matters this user may place holds on: all for admins, their own for partners. */
export async function listHoldableMatters(user: CurrentUser): Promise<{ id: number; number: string; title: string }[]> {
  if (user.role !== "admin" && user.role !== "partner") return [];
  const q = getDb()("matters as m").select("m.id", "m.number", "m.title").orderBy("m.number");
  if (user.role === "partner") q.whereExists((e) => e.select(e.client.raw("1")).from("matter_members as hm").whereRaw("hm.matter_id = m.id").where("hm.user_id", user.id));
  return q;
}
