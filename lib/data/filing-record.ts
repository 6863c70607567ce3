import "server-only";
// The filing record: a document's timeline, the latest suggestion in words, and the audit list.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { canSeeDocument, findWalledMatters, whereDocumentVisible, type WalledMatters } from "@/lib/data/document-access";
import { loadNameHistory, nameAt } from "@/lib/data/historic-names";
import { notFound } from "@/lib/errors";
import type { CurrentUser } from "@/lib/data/users";

export interface FilingEvent {
  id: number;
  documentId: number;
  documentName: string;
  at: string;
  action: string;
  user: string | null; // null: Foldwright itself
  fromCabinetType: string | null;
  toCabinetType: string | null;
  fromMatter: string | null;
  toMatter: string | null;
  modelVersionId: number | null;
  confidence: number | null;
  reason: string | null;
  /** For an "undone" event: the event it reversed. */
  reversesEventId: number | null;
}

function events(db: Knex) {
  return db("filing_events as e")
    .join("documents as d", "d.id", "e.document_id")
    .leftJoin("matters as m", "m.id", "d.matter_id")
    .leftJoin("users as u", "u.id", "e.user_id")
    .leftJoin("cabinet_types as fc", "fc.id", "e.from_cabinet_type_id")
    .leftJoin("cabinet_types as tc", "tc.id", "e.to_cabinet_type_id")
    .leftJoin("matters as fm", "fm.id", "e.from_matter_id")
    .leftJoin("matters as tm", "tm.id", "e.to_matter_id")
    .select(
      "e.id", "e.document_id", "d.original_name", "e.created_at", "e.action", "u.name as user_name",
      "fc.name as from_type", "tc.name as to_type", "fm.number as from_matter", "tm.number as to_matter",
      "e.model_version_id", "e.confidence", "e.reason", "e.reverses_event_id",
      "e.from_cabinet_type_id", "e.to_cabinet_type_id", "e.from_matter_id", "e.to_matter_id",
    );
}

const toEvent = (r: Record<string, unknown>): FilingEvent => ({
  id: Number(r.id),
  documentId: Number(r.document_id),
  documentName: String(r.original_name),
  at: new Date(r.created_at as string).toISOString(),
  action: String(r.action),
  user: (r.user_name as string | null) ?? null,
  fromCabinetType: (r.from_type as string | null) ?? null,
  toCabinetType: (r.to_type as string | null) ?? null,
  fromMatter: (r.from_matter as string | null) ?? null,
  toMatter: (r.to_matter as string | null) ?? null,
  modelVersionId: (r.model_version_id as number | null) ?? null,
  confidence: r.confidence === null ? null : Number(r.confidence),
  reason: (r.reason as string | null) ?? null,
  reversesEventId: r.reverses_event_id === null || r.reverses_event_id === undefined ? null : Number(r.reverses_event_id),
});

/** Events with the cabinet type names and matter numbers they had when they happened (a rename later changes nothing). */
async function withHistoricNames(db: Knex, rows: Record<string, unknown>[]): Promise<FilingEvent[]> {
  const ids = (keys: string[]) => rows.flatMap((r) => keys.map((k) => Number(r[k])));
  const [types, matters] = await Promise.all([
    loadNameHistory(db, "cabinet_type", ids(["from_cabinet_type_id", "to_cabinet_type_id"])),
    loadNameHistory(db, "matter", ids(["from_matter_id", "to_matter_id"])),
  ]);
  const id = (v: unknown) => (v === null || v === undefined ? null : Number(v));
  return rows.map((r) => {
    const e = toEvent(r);
    const at = new Date(e.at);
    return {
      ...e,
      fromCabinetType: nameAt(types, "cabinet_type", id(r.from_cabinet_type_id), at, e.fromCabinetType),
      toCabinetType: nameAt(types, "cabinet_type", id(r.to_cabinet_type_id), at, e.toCabinetType),
      fromMatter: nameAt(matters, "matter", id(r.from_matter_id), at, e.fromMatter),
      toMatter: nameAt(matters, "matter", id(r.to_matter_id), at, e.toMatter),
    };
  });
}

/**
 * One document's record, for someone who may see the document (else 404, as if it did not exist).
 * A visible document is linked to no matter walled off from this user, so no event of its
 * record can name one.
 */
export async function listDocumentTimeline(user: CurrentUser, documentId: number): Promise<FilingEvent[]> {
  if (!(await canSeeDocument(user, documentId))) throw notFound("That document");
  const db = getDb();
  return withHistoricNames(db, await events(db).where("e.document_id", documentId).orderBy("e.id"));
}

export interface EventFilters {
  action?: string;
  documentId?: number;
  from?: string;
  to?: string;
  page: number;
  pageSize: number;
}

/** The audit list; events of documents behind an ethical wall only for that team and admins. */
function filteredEvents(db: Knex, user: CurrentUser, f: Omit<EventFilters, "page" | "pageSize">, walled: WalledMatters) {
  const q = whereDocumentVisible(events(db), user, "d", walled);
  if (f.action) q.where("e.action", f.action);
  if (f.documentId) q.where("e.document_id", f.documentId);
  if (f.from) q.where("e.created_at", ">=", f.from);
  if (f.to) q.where("e.created_at", "<", f.to);
  return q;
}

export async function listFilingEvents(user: CurrentUser, f: EventFilters): Promise<{ items: FilingEvent[]; total: number }> {
  const db = getDb();
  const q = filteredEvents(db, user, f, await findWalledMatters(user));
  const [{ total }] = await q.clone().clearSelect().count({ total: "e.id" });
  const rows = await q.orderBy("e.id", "desc").limit(f.pageSize).offset((f.page - 1) * f.pageSize);
  return { items: await withHistoricNames(db, rows), total: Number(total) };
}

export interface SuggestionDetail {
  method: string;
  modelVersionId: number | null;
  createdAt: string;
  noConfidentMatch: boolean;
  ranked: { cabinetTypeId: number; name: string; confidence: number; probability: number | null; source: string }[];
  why: { term: string; weight: number }[];
  matterCandidates: { matterId: number; number: string; title: string; score: number; reasons: string[] }[];
  matterId: number | null;
  matterAmbiguous: boolean;
}

const parse = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

export async function getLatestSuggestion(user: CurrentUser, documentId: number): Promise<SuggestionDetail | null> {
  if (!(await canSeeDocument(user, documentId))) throw notFound("That document");
  const db = getDb();
  const s = await db("suggestions").where({ document_id: documentId }).orderBy("id", "desc").first();
  if (!s) return null;
  const names = new Map((await listCabinetTypes(user)).map((t) => [t.id, t.name]));
  const visible = new Map((await listVisibleMatters(user)).map((m) => [m.id, m]));
  const ranked = parse<{ cabinetTypeId: number; confidence: number; probability: number | null; source?: string }[]>(s.ranked);
  const candidates = parse<{ matterId: number; score: number; reasons: string[] }[]>(s.matter_candidates).filter((c) => visible.has(c.matterId));
  return {
    method: s.method,
    modelVersionId: s.model_version_id,
    createdAt: new Date(s.created_at).toISOString(),
    noConfidentMatch: Boolean(s.no_confident_match),
    ranked: ranked.map((r) => ({ cabinetTypeId: r.cabinetTypeId, name: names.get(r.cabinetTypeId) ?? `#${r.cabinetTypeId}`, confidence: r.confidence, probability: r.probability ?? null, source: r.source ?? "model" })),
    why: parse(s.why),
    matterCandidates: candidates.map((c) => ({ ...c, number: visible.get(c.matterId)!.number, title: visible.get(c.matterId)!.title })),
    matterId: s.top_matter_id && visible.has(s.top_matter_id) ? s.top_matter_id : null,
    matterAmbiguous: Boolean(s.matter_ambiguous),
  };
}

/**
 * The audit list as CSV (RFC 4180: quotes doubled, fields with commas or quotes quoted). A cell
 * that starts like a formula (=, +, -, @) gets a leading apostrophe so a spreadsheet shows it
 * as text (common practice against CSV injection).
 */
const CSV_HEAD = ["id", "at", "document_id", "document", "action", "user", "from_cabinet_type", "to_cabinet_type", "from_matter", "to_matter", "model_version", "confidence", "reason", "reverses_event"];

function csvCell(v: unknown): string {
  let s = v === null || v === undefined ? "" : String(v);
  if (/^[=+\-@]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

function csvLines(items: FilingEvent[]): string {
  return items
    .map((e) => [e.id, e.at, e.documentId, e.documentName, e.action, e.user ?? "Foldwright", e.fromCabinetType, e.toCabinetType, e.fromMatter, e.toMatter, e.modelVersionId, e.confidence, e.reason, e.reversesEventId].map(csvCell).join(",") + "\r\n")
    .join("");
}

export function toCsv(items: FilingEvent[]): string {
  return CSV_HEAD.join(",") + "\r\n" + csvLines(items);
}

/** Events per database round trip of the streamed export. */
export const CSV_BATCH = 1_000;

/**
 * Every event the filters match, newest first, as CSV streamed a batch at a time: keyset pages on
 * the primary key (`e.id < last`), so memory stays one batch however long the record is, and
 * the wall and historic names apply as in the list.
 */
export function streamFilingEventsCsv(user: CurrentUser, f: Omit<EventFilters, "page" | "pageSize">): ReadableStream<Uint8Array> {
  const db = getDb();
  const encoder = new TextEncoder();
  let last: number | null = null;
  let started = false;
  let walled: WalledMatters | null = null;
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (!started) {
        started = true;
        controller.enqueue(encoder.encode(CSV_HEAD.join(",") + "\r\n"));
        return;
      }
      // The wall as it stands when the export starts, for the whole file.
      walled ??= await findWalledMatters(user);
      const q = filteredEvents(db, user, f, walled);
      if (last !== null) q.where("e.id", "<", last);
      const rows = await q.orderBy("e.id", "desc").limit(CSV_BATCH);
      if (rows.length === 0) {
        controller.close();
        return;
      }
      last = Number(rows[rows.length - 1].id);
      controller.enqueue(encoder.encode(csvLines(await withHistoricNames(db, rows))));
    },
  });
}
