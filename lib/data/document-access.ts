import "server-only";
// The ethical wall — the one rule every read of documents and matters goes through.
//
// A document is *linked* to every matter it was ever filed into, suggested into, listed as a
// matter candidate of, or moved from or to (document_matter_links, written only by
// lib/data/record.ts with the event that made the link). A user outside a restricted matter's
// team (admins are always inside) gets nothing of a document linked to it: not in lists, search,
// counts, queues, pages, text, originals, previews, timelines, the record or its CSV. The rule
// reads `matters.restricted` and `matter_members` at query time, so restricting a matter or
// removing someone from its team takes effect on that person's next request.
import type { Knex } from "knex";
import { getDb } from "@/db";
import type { CurrentUser } from "@/lib/data/users";

type Query = Knex.QueryBuilder;

/** SQL (with bindings) true when a restricted matter with id `matterExpr` is closed to the user. */
function walledMatterSql(matterExpr: string, user: CurrentUser): [string, Knex.RawBinding[]] {
  return [
    `EXISTS (SELECT 1 FROM matters wm WHERE wm.id = ${matterExpr} AND wm.restricted = 1
       AND NOT EXISTS (SELECT 1 FROM matter_members wmm WHERE wmm.matter_id = wm.id AND wmm.user_id = ?))`,
    [user.id],
  ];
}

/**
 * True for a document behind a wall the user is outside of: through any link on its record, or
 * through the matter it is filed in now (so a row written without its link is still walled).
 */
export function walledDocumentSql(alias: string, user: CurrentUser): [string, Knex.RawBinding[]] {
  const [viaLink, b1] = walledMatterSql("wl.matter_id", user);
  if (user.role === "admin") return ["(1 = 0)", []];
  const [viaFiled, b2] = walledMatterSql("??.matter_id", user);
  return [
    `(EXISTS (SELECT 1 FROM document_matter_links wl WHERE wl.document_id = ??.id AND ${viaLink}) OR (??.matter_id IS NOT NULL AND ${viaFiled}))`,
    [alias, ...b1, alias, alias, ...b2],
  ];
}

/**
 * The restricted matters closed to this user, read once for a request (lists over many
 * documents): the same rule as walledMatterSql, as a list of ids. Admins: none.
 */
export interface WalledMatters {
  userId: number;
  ids: number[];
}

export async function findWalledMatters(user: CurrentUser, db: Knex | Knex.Transaction = getDb()): Promise<WalledMatters> {
  if (user.role === "admin") return { userId: user.id, ids: [] };
  const ids: number[] = await db("matters as wm")
    .where("wm.restricted", true)
    .whereNotExists((s) => s.select(db.raw("1")).from("matter_members as wmm").whereRaw("wmm.matter_id = wm.id").where("wmm.user_id", user.id))
    .pluck("wm.id");
  return { userId: user.id, ids: ids.map(Number) };
}

/**
 * Keeps only documents (aliased `alias`) the user may know exist. With `walled` (from
 * findWalledMatters in the same request) the same rule is written against that list: a document
 * filed in one of those matters, or linked to one (one subquery the database materialises once
 * through document_matter_links' (matter_id, document_id) index), is left out — instead of two
 * correlated EXISTS per row, which a list over 100,000 documents cannot afford.
 */
export function whereDocumentVisible(q: Query, user: CurrentUser, alias = "d", walled?: WalledMatters): Query {
  if (user.role === "admin") return q;
  if (walled) {
    if (walled.userId !== user.id) throw new Error("The walled matters were read for another user.");
    if (walled.ids.length === 0) return q;
    const list = walled.ids.map(() => "?").join(", ");
    return q.whereRaw(
      `(??.matter_id IS NULL OR ??.matter_id NOT IN (${list})) AND ??.id NOT IN (SELECT wl.document_id FROM document_matter_links wl WHERE wl.matter_id IN (${list}))`,
      [alias, alias, ...walled.ids, alias, ...walled.ids],
    );
  }
  const [sql, bindings] = walledDocumentSql(alias, user);
  return q.whereRaw(`NOT (${sql})`, bindings);
}

/** The opposite, for the few places that must say "restricted" without showing anything else. */
export function whereDocumentWalled(q: Query, user: CurrentUser, alias = "d"): Query {
  if (user.role === "admin") return q.whereRaw("1 = 0");
  const [sql, bindings] = walledDocumentSql(alias, user);
  return q.whereRaw(sql, bindings);
}

/** Keeps only matters (aliased `alias`) the user may see: open ones, or restricted ones they are on. */
export function whereMatterVisible(q: Query, user: CurrentUser, alias = "m"): Query {
  if (user.role === "admin") return q;
  const [walled, bindings] = walledMatterSql("??.id", user);
  return q.whereRaw(`NOT ${walled}`, [alias, ...bindings]);
}

/** True when the user may know the document exists (and it does). */
export async function canSeeDocument(user: CurrentUser, documentId: number, db: Knex | Knex.Transaction = getDb()): Promise<boolean> {
  const row = await whereDocumentVisible(db("documents as d").where("d.id", documentId), user).first("d.id");
  return Boolean(row);
}

/** Of these document ids, the ones the user may know exist. */
export async function visibleDocumentIds(user: CurrentUser, ids: number[]): Promise<Set<number>> {
  if (ids.length === 0) return new Set();
  const rows: number[] = await whereDocumentVisible(getDb()("documents as d").whereIn("d.id", ids), user).pluck("d.id");
  return new Set(rows.map(Number));
}

export function documentsWithMatters(db: Knex): Query {
  return db("documents as d").leftJoin("matters as m", "m.id", "d.matter_id");
}
