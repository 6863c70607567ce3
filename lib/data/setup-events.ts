import "server-only";
// Reads of the setup record (admins, auditors). Events about a restricted matter or its team
// reach only that team and admins, like everything else of the matter; so do events of a client
// whose every matter is walled off from the reader.
import { Readable, Transform } from "node:stream";
import { stringify } from "csv-stringify";
import type { Knex } from "knex";
import { getDb } from "@/db";
import { whereMatterVisible } from "@/lib/data/document-access";
import { parseJson } from "@/lib/data/setup-shared";
import type { CurrentUser } from "@/lib/data/users";

export interface SetupEvent {
  id: number;
  at: string;
  user: string | null; // null: Foldwright itself
  entity: string;
  entityId: number | null;
  action: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
  reason: string | null;
}

export interface SetupEventFilters {
  entity?: string;
  entityId?: number;
}

function visibleEvents(db: Knex, user: CurrentUser, f: SetupEventFilters): Knex.QueryBuilder {
  const q = db("setup_events as se").leftJoin("users as u", "u.id", "se.user_id").select("se.id", "se.created_at", "u.name as user_name", "se.entity", "se.entity_id", "se.action", "se.before", "se.after", "se.reason");
  if (f.entity) q.where("se.entity", f.entity);
  if (f.entityId) q.where("se.entity_id", f.entityId);
  if (user.role === "admin") return q;
  const matterSeen = whereMatterVisible(db("matters as m").whereRaw("m.id = se.entity_id"), user).select(db.raw("1"));
  const clientHasMatters = db("matters as cm").whereRaw("cm.client_id = se.entity_id").select(db.raw("1"));
  const clientSeen = whereMatterVisible(db("matters as m").whereRaw("m.client_id = se.entity_id"), user).select(db.raw("1"));
  return q.where((w) =>
    w
      .whereNotIn("se.entity", ["matter", "team", "client"])
      .orWhere((m) => m.whereIn("se.entity", ["matter", "team"]).whereExists(matterSeen))
      .orWhere((c) => c.where("se.entity", "client").where((v) => v.whereNotExists(clientHasMatters).orWhereExists(clientSeen))),
  );
}

const toEvent = (r: Record<string, unknown>): SetupEvent => ({
  id: Number(r.id),
  at: new Date(r.created_at as string).toISOString(),
  user: (r.user_name as string | null) ?? null,
  entity: String(r.entity),
  entityId: r.entity_id === null ? null : Number(r.entity_id),
  action: String(r.action),
  before: parseJson<Record<string, unknown> | null>(r.before, null),
  after: parseJson<Record<string, unknown> | null>(r.after, null),
  reason: (r.reason as string | null) ?? null,
});

export async function listSetupEvents(user: CurrentUser, f: SetupEventFilters & { page: number; pageSize: number }): Promise<{ items: SetupEvent[]; total: number }> {
  const db = getDb();
  const q = visibleEvents(db, user, f);
  const [{ total }] = await q.clone().clearSelect().count({ total: "se.id" });
  const rows = await q.orderBy("se.id", "desc").limit(f.pageSize).offset((f.page - 1) * f.pageSize);
  return { items: rows.map(toEvent), total: Number(total) };
}

export const SETUP_CSV_COLUMNS = ["id", "at", "user", "entity", "entity_id", "action", "before", "after", "reason"];

/**
 * The record as CSV, streamed from the database row by row (csv-stringify: RFC 4180 quoting;
 * `escape_formulas` puts an apostrophe before a cell starting with = + - @ or a tab, so a
 * spreadsheet shows it as text — common practice against CSV injection).
 */
export function streamSetupEventsCsv(user: CurrentUser, f: SetupEventFilters & { limit: number }): ReadableStream<Uint8Array> {
  const rows = visibleEvents(getDb(), user, f).orderBy("se.id", "desc").limit(f.limit).stream();
  const toRecord = new Transform({
    objectMode: true,
    transform(r: Record<string, unknown>, _enc, done) {
      const e = toEvent(r);
      done(null, [e.id, e.at, e.user ?? "Foldwright", e.entity, e.entityId, e.action, e.before ? JSON.stringify(e.before) : "", e.after ? JSON.stringify(e.after) : "", e.reason ?? ""]);
    },
  });
  const csv = stringify({ header: true, columns: SETUP_CSV_COLUMNS, escape_formulas: true, record_delimiter: "windows" });
  // A failing query ends the download with an error rather than a silently short file.
  rows.on("error", (e: Error) => csv.destroy(e));
  toRecord.on("error", (e: Error) => csv.destroy(e));
  rows.pipe(toRecord).pipe(csv);
  return Readable.toWeb(csv) as ReadableStream<Uint8Array>;
}
