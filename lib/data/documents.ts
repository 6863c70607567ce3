import "server-only";
// Reading documents: one with its state and masked text, lists with filters and search, and
// the original's location for a download — all through the ethical wall.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { maskSensitive } from "@/lib/intake";
import { AppError, notFound } from "@/lib/errors";
import { documentsWithMatters, findWalledMatters, walledDocumentSql, whereDocumentVisible, type WalledMatters } from "@/lib/data/document-access";
import type { CurrentUser } from "@/lib/data/users";
import { dueOnSql, heldSql } from "@/lib/data/retention-sql";
import { addDays, describeRule, DUE_SOON_DAYS, retentionDate, utcDay, type RetentionBasis, type RetentionTrigger } from "@/lib/records/retention-date";

export interface DocumentSummary {
  id: number;
  name: string;
  mediaType: string;
  sizeBytes: number;
  status: "reading" | "ready" | "unreadable";
  reason: string | null;
  uploadedAt: string;
  uploadedBy: string;
  matter: string | null;
  cabinetType: string | null;
  /** Where it is filed, as ids (for links back to its cabinet and for Move). */
  matterId: number | null;
  cabinetTypeId: number | null;
  ocrUsed: boolean;
  pageCount: number | null;
  filedAt: string | null;
  filedHow: string | null;
  filedBy: string | null;
  /** Under a legal hold now (on the document, its matter, or a matter it was linked to). */
  legalHold: boolean;
  /**
   * Only on the uploader's own Intake list: the document is behind a wall the uploader is outside
   * of. Then the name and this flag are all there is; every other field is blanked.
   */
  restricted?: true;
  retention: DocumentRetention;
  /** A tombstone: the original was destroyed and the text cleared on this date. */
  disposedAt: string | null;
}

export interface DocumentRetention {
  dueOn: string | null;
  basis: RetentionBasis;
  rule: string | null; // the cabinet type's rule in words
}

/** What the uploader of a walled document sees of it at Intake, and nothing else. */
export const RESTRICTED_NOTE = "Restricted — ask the matter's team.";

export interface DocumentDetail extends DocumentSummary {
  charCount: number | null;
  readMs: number | null;
  sensitive: { ssn: number; routing: number; card: number };
  /** The text read, with SSNs, routing and card numbers masked. */
  text: string | null;
  textTruncated: boolean;
}

const PREVIEW_CHARS = 200_000;

const SUMMARY_COLUMNS = [
  "d.id",
  "d.original_name",
  "d.media_type",
  "d.size_bytes",
  "d.status",
  "d.unreadable_reason",
  "d.uploaded_at",
  "d.ocr_used",
  "d.page_count",
  "u.name as uploader",
  "m.number as matter",
  "c.name as cabinet",
  "d.matter_id",
  "d.cabinet_type_id",
  "d.filed_at",
  "d.filed_how",
  "fu.name as filer",
  "c.retention_years",
  "c.retention_trigger",
  "m.status as matter_status",
  "m.closed_on as matter_closed_on",
  "d.disposed_at",
];

function summaryColumns(db: ReturnType<typeof getDb>) {
  return [...SUMMARY_COLUMNS, db.raw(`${heldSql("d")} AS held`)];
}

const day = (v: unknown) => (v ? utcDay(v as string) : null);

function toRetention(r: Row): DocumentRetention {
  if (!r.retention_trigger) return { dueOn: null, basis: "not_filed", rule: null };
  const rule = { years: r.retention_years === null ? null : Number(r.retention_years), trigger: r.retention_trigger as RetentionTrigger };
  const date = retentionDate(rule, { filedOn: day(r.filed_at), matterStatus: (r.matter_status as "open" | "closed" | null) ?? null, matterClosedOn: day(r.matter_closed_on) });
  return { ...date, rule: describeRule(rule) };
}

type Row = Record<string, unknown>;

function toSummary(r: Row): DocumentSummary {
  return {
    id: Number(r.id),
    name: String(r.original_name),
    mediaType: String(r.media_type),
    sizeBytes: Number(r.size_bytes),
    status: r.status as DocumentSummary["status"],
    reason: (r.unreadable_reason as string | null) ?? null,
    uploadedAt: new Date(r.uploaded_at as string).toISOString(),
    uploadedBy: String(r.uploader),
    matter: (r.matter as string | null) ?? null,
    cabinetType: (r.cabinet as string | null) ?? null,
    matterId: r.matter_id === null || r.matter_id === undefined ? null : Number(r.matter_id),
    cabinetTypeId: r.cabinet_type_id === null || r.cabinet_type_id === undefined ? null : Number(r.cabinet_type_id),
    ocrUsed: Boolean(r.ocr_used),
    pageCount: r.page_count === null ? null : Number(r.page_count),
    filedAt: r.filed_at ? new Date(r.filed_at as string).toISOString() : null,
    filedHow: (r.filed_how as string | null) ?? null,
    filedBy: (r.filer as string | null) ?? null,
    legalHold: Boolean(Number(r.held)),
    retention: toRetention(r),
    disposedAt: r.disposed_at ? new Date(r.disposed_at as string).toISOString() : null,
  };
}

/** Documents with what a summary shows of them: uploader, filer, matter and cabinet type. */
function documentsWithNames(db: Knex) {
  return documentsWithMatters(db)
    .leftJoin("users as u", "u.id", "d.uploaded_by")
    .leftJoin("users as fu", "fu.id", "d.filed_by")
    .leftJoin("cabinet_types as c", "c.id", "d.cabinet_type_id");
}

function visibleDocuments(user: CurrentUser, walled?: WalledMatters) {
  return whereDocumentVisible(documentsWithNames(getDb()), user, "d", walled);
}

/**
 * A document behind a wall is answered exactly like one that does not exist (404), so the
 * answer never tells an outsider that a restricted matter holds something.
 */
const missing = () => notFound("That document");

function toRestrictedStub(r: Row): DocumentSummary {
  return {
    id: Number(r.id), name: String(r.original_name), mediaType: "", sizeBytes: 0, status: "ready", reason: RESTRICTED_NOTE,
    uploadedAt: new Date(r.uploaded_at as string).toISOString(), uploadedBy: "", matter: null, cabinetType: null, matterId: null, cabinetTypeId: null, ocrUsed: false,
    pageCount: null, filedAt: null, filedHow: null, filedBy: null, legalHold: false, restricted: true,
    retention: { dueOn: null, basis: "not_filed", rule: null }, disposedAt: null,
  };
}

export async function getDocument(user: CurrentUser, id: number): Promise<DocumentDetail> {
  const r = await visibleDocuments(user)
    .where("d.id", id)
    .first([...summaryColumns(getDb()), "d.char_count", "d.read_ms", "d.ssn_count", "d.routing_count", "d.card_count", "d.text"]);
  if (!r) throw missing();
  const text = r.text as string | null;
  return {
    ...toSummary(r),
    charCount: r.char_count ?? null,
    readMs: r.read_ms ?? null,
    sensitive: { ssn: r.ssn_count, routing: r.routing_count, card: r.card_count },
    text: text === null ? null : maskSensitive(text.slice(0, PREVIEW_CHARS)),
    textTruncated: text !== null && text.length > PREVIEW_CHARS,
  };
}

export interface DocumentFilters {
  status?: DocumentSummary["status"];
  q?: string;
  uploadedByMe?: boolean;
  ids?: number[];
  cabinetTypeId?: number;
  matterId?: number;
  filed?: boolean;
  /** past_due: the retention date is today or earlier; due_soon: within the next 90 days. */
  retention?: "past_due" | "due_soon";
  page: number;
  pageSize: number;
}

/** Words a person typed, as a MariaDB boolean full-text query: every word required, as a prefix. */
export function toFulltextQuery(q: string): string {
  // Only letters and digits reach the index: an operator (+ - < > ( ) ~ * " @ %) alone is a syntax error.
  return q
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean)
    .map((w) => `+${w}*`)
    .join(" ");
}

/**
 * The uploader's own list at Intake (mine or ids, with nothing else that reads the document)
 * keeps their walled uploads as name-only stubs; every other list simply leaves them out.
 */
function keepsOwnStubs(f: DocumentFilters): boolean {
  return Boolean(f.uploadedByMe || f.ids?.length) && !f.q && !f.status && !f.cabinetTypeId && !f.matterId && f.filed === undefined;
}

export async function listDocuments(user: CurrentUser, f: DocumentFilters): Promise<{ items: DocumentSummary[]; total: number }> {
  if (keepsOwnStubs(f)) return listOwnUploads(user, f);
  const base = visibleDocuments(user, await findWalledMatters(user));
  if (f.status) base.where("d.status", f.status);
  if (f.uploadedByMe) base.where("d.uploaded_by", user.id);
  if (f.ids?.length) base.whereIn("d.id", f.ids);
  if (f.cabinetTypeId) base.where("d.cabinet_type_id", f.cabinetTypeId);
  if (f.matterId) base.where("d.matter_id", f.matterId);
  if (f.filed !== undefined) base.where((w) => (f.filed ? w.whereNotNull("d.filed_at") : w.whereNull("d.filed_at")));
  if (f.retention) {
    const today = utcDay(new Date());
    base.whereNull("d.disposed_at");
    if (f.retention === "past_due") base.whereRaw(`${dueOnSql()} <= ?`, [today]);
    else base.whereRaw(`${dueOnSql()} > ? AND ${dueOnSql()} <= ?`, [today, addDays(today, DUE_SOON_DAYS)]);
  }
  const search = f.q ? toFulltextQuery(f.q) : "";
  if (search) base.whereRaw("MATCH(d.original_name, d.text) AGAINST (? IN BOOLEAN MODE)", [search]);
  const [{ total }] = await base.clone().clearSelect().count({ total: "d.id" });
  const rows = await base
    .select(summaryColumns(getDb()))
    .orderByRaw(f.filed ? "d.filed_at DESC" : "d.uploaded_at DESC")
    .orderBy("d.id", "desc")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  return { items: rows.map(toSummary), total: Number(total) };
}

async function listOwnUploads(user: CurrentUser, f: DocumentFilters): Promise<{ items: DocumentSummary[]; total: number }> {
  const db = getDb();
  const [walled, bindings] = walledDocumentSql("d", user);
  const base = documentsWithNames(db).where("d.uploaded_by", user.id);
  if (f.ids?.length) base.whereIn("d.id", f.ids);
  const [{ total }] = await base.clone().count({ total: "d.id" });
  const rows = await base
    .select([...summaryColumns(db), db.raw(`${walled} AS walled`, bindings)])
    .orderBy("d.uploaded_at", "desc")
    .orderBy("d.id", "desc")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  return { items: rows.map((r: Row) => (Number(r.walled) ? toRestrictedStub(r) : toSummary(r))), total: Number(total) };
}

export async function findOriginal(user: CurrentUser, id: number): Promise<{ key: string; name: string; mediaType: string; size: number }> {
  const r = await visibleDocuments(user).where("d.id", id).first("d.storage_key", "d.original_name", "d.media_type", "d.size_bytes", "d.disposed_at");
  if (!r) throw missing();
  if (r.disposed_at) throw new AppError(410, "disposed", `This document's original was destroyed on ${utcDay(r.disposed_at)} under an approved disposal; only its tombstone remains. The certificate of disposal is in Disposal.`);
  return { key: r.storage_key, name: r.original_name, mediaType: r.media_type, size: Number(r.size_bytes) };
}

export interface CabinetCount {
  matterId: number;
  matter: string;
  matterTitle: string;
  clientName: string;
  restricted: boolean;
  cabinetTypeId: number;
  cabinetType: string;
  documents: number;
  lastFiledAt: string;
}

/** The filed cabinets this user may see: one row per matter and cabinet type, with counts. */
export async function listCabinets(user: CurrentUser): Promise<CabinetCount[]> {
  const db = getDb();
  const q = documentsWithMatters(db)
    .join("cabinet_types as c", "c.id", "d.cabinet_type_id")
    .join("clients as cl", "cl.id", "m.client_id")
    .whereNotNull("d.filed_at")
    .groupBy("m.id", "m.number", "m.title", "cl.name", "m.restricted", "c.id", "c.name")
    .select("m.id as matter_id", "m.number", "m.title", "cl.name as client", "m.restricted", "c.id as type_id", "c.name as type_name")
    .count({ n: "d.id" })
    .max({ last: "d.filed_at" })
    .orderBy([{ column: "m.number" }, { column: "c.name" }]);
  const rows = await whereDocumentVisible(q, user, "d", await findWalledMatters(user));
  return rows.map((r: Record<string, unknown>) => ({
    matterId: Number(r.matter_id),
    matter: String(r.number),
    matterTitle: String(r.title),
    clientName: String(r.client),
    restricted: Boolean(r.restricted),
    cabinetTypeId: Number(r.type_id),
    cabinetType: String(r.type_name),
    documents: Number(r.n),
    lastFiledAt: new Date(r.last as string).toISOString(),
  }));
}
