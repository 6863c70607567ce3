import "server-only";
// The To review queue (read, not filed) and the spot-check list (auto-filed, not yet confirmed).
import type { Knex } from "knex";
import { getDb } from "@/db";
import { findWalledMatters, whereDocumentVisible, type WalledMatters } from "@/lib/data/document-access";
import { toFulltextQuery } from "@/lib/data/documents";
import { heldSql } from "@/lib/data/retention-sql";
import type { CurrentUser } from "@/lib/data/users";

export interface QueueFilters {
  list: "review" | "spot-check";
  sort: "age" | "confidence" | "cabinet" | "matter";
  dir: "asc" | "desc";
  cabinetTypeId?: number;
  matterId?: number;
  minConfidence?: number;
  maxConfidence?: number;
  /** Words of the file name or the text read (every word must match, as a prefix). */
  q?: string;
  page: number;
  pageSize: number;
}

export interface QueueItem {
  id: number;
  name: string;
  status: "ready" | "unreadable";
  reason: string | null;
  uploadedAt: string;
  pageCount: number | null;
  ocrUsed: boolean;
  filedHow: string | null;
  legalHold: boolean;
  suggestion: null | {
    method: "model" | "cold_start" | "blended";
    modelVersionId: number | null;
    cabinetTypeId: number | null;
    cabinetType: string | null;
    confidence: number | null;
    noConfidentMatch: boolean;
    matterId: number | null;
    matter: string | null;
    matterAmbiguous: boolean;
  };
  filedIn: null | { cabinetTypeId: number; cabinetType: string; matterId: number; matter: string };
}

const SORTS: Record<QueueFilters["sort"], string> = { age: "d.uploaded_at", confidence: "s.top_confidence", cabinet: "ct.name", matter: "sm.number" };

function baseQuery(db: Knex, user: CurrentUser, f: QueueFilters, walled: WalledMatters) {
  const q = db("documents as d")
    .leftJoin("matters as m", "m.id", "d.matter_id")
    .leftJoin("suggestions as s", "s.id", db.raw("(SELECT MAX(x.id) FROM suggestions x WHERE x.document_id = d.id)"))
    .leftJoin("cabinet_types as ct", "ct.id", "s.top_cabinet_type_id")
    .leftJoin("matters as sm", "sm.id", "s.top_matter_id");
  whereDocumentVisible(q, user, "d", walled);
  if (f.list === "review") {
    q.whereNull("d.filed_at").where((w) => w.where("d.status", "unreadable").orWhere((r) => r.where("d.status", "ready").whereNotNull("s.id")));
  } else {
    q.where("d.filed_how", "auto").whereNull("d.confirmed_at");
  }
  if (f.cabinetTypeId) q.where("s.top_cabinet_type_id", f.cabinetTypeId);
  if (f.matterId) q.where("s.top_matter_id", f.matterId);
  if (f.minConfidence !== undefined) q.where("s.top_confidence", ">=", f.minConfidence);
  if (f.maxConfidence !== undefined) q.where("s.top_confidence", "<=", f.maxConfidence);
  const words = f.q?.trim() ?? "";
  if (words) {
    // The full-text index finds words of the name and the text; a file name is also matched as
    // typed (the index splits "invoice-0117.pdf" into words and drops short ones).
    const search = toFulltextQuery(words);
    const like = `%${words.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    q.where((w) => {
      if (search) w.whereRaw("MATCH(d.original_name, d.text) AGAINST (? IN BOOLEAN MODE)", [search]);
      w.orWhere("d.original_name", "like", like);
    });
  }
  return q;
}

export interface TypeCount {
  /** null: documents with no suggested cabinet type (unreadable, to file by hand). */
  cabinetTypeId: number | null;
  cabinetType: string | null;
  count: number;
}

/** How many of the queue (its other filters kept, the cabinet type filter left out) wait per suggested cabinet type. */
export async function countQueueByType(user: CurrentUser, f: QueueFilters): Promise<TypeCount[]> {
  const db = getDb();
  const rows = await baseQuery(db, user, { ...f, cabinetTypeId: undefined }, await findWalledMatters(user))
    .groupBy("s.top_cabinet_type_id", "ct.name")
    .select("s.top_cabinet_type_id as id", "ct.name as name", db.raw("COUNT(*) AS n"))
    .orderByRaw("ct.name IS NULL, ct.name");
  return rows.map((r: { id: number | null; name: string | null; n: number | string }) => ({ cabinetTypeId: r.id, cabinetType: r.name, count: Number(r.n) }));
}

export async function listQueue(user: CurrentUser, f: QueueFilters): Promise<{ items: QueueItem[]; total: number }> {
  const db = getDb();
  const walled = await findWalledMatters(user);
  const [{ total }] = await baseQuery(db, user, f, walled).count({ total: "d.id" });
  const rows = await baseQuery(db, user, f, walled)
    .leftJoin("cabinet_types as fct", "fct.id", "d.cabinet_type_id")
    .select(
      "d.id", "d.original_name", "d.status", "d.unreadable_reason", "d.uploaded_at", "d.page_count", "d.ocr_used", "d.filed_how",
      "d.cabinet_type_id", "d.matter_id", "fct.name as filed_type", "m.number as filed_matter",
      "s.id as sid", "s.method", "s.model_version_id", "s.top_cabinet_type_id", "ct.name as top_type", "s.top_confidence",
      "s.no_confident_match", "s.top_matter_id", "sm.number as top_matter", "s.matter_ambiguous",
      db.raw(`${heldSql("d")} AS held`),
    )
    .orderByRaw(`${SORTS[f.sort]} IS NULL, ${SORTS[f.sort]} ${f.dir === "asc" ? "ASC" : "DESC"}`)
    .orderBy("d.id", f.dir === "asc" ? "asc" : "desc")
    .limit(f.pageSize)
    .offset((f.page - 1) * f.pageSize);
  const items = rows.map(
    (r): QueueItem => ({
      id: r.id,
      name: r.original_name,
      status: r.status,
      reason: r.unreadable_reason,
      uploadedAt: new Date(r.uploaded_at).toISOString(),
      pageCount: r.page_count,
      ocrUsed: Boolean(r.ocr_used),
      filedHow: r.filed_how,
      legalHold: Boolean(Number(r.held)),
      suggestion: r.sid
        ? {
            method: r.method,
            modelVersionId: r.model_version_id,
            cabinetTypeId: r.top_cabinet_type_id,
            cabinetType: r.top_type,
            confidence: r.top_confidence === null ? null : Number(r.top_confidence),
            noConfidentMatch: Boolean(r.no_confident_match),
            matterId: r.top_matter_id,
            matter: r.top_matter,
            matterAmbiguous: Boolean(r.matter_ambiguous),
          }
        : null,
      filedIn: r.filed_how ? { cabinetTypeId: r.cabinet_type_id, cabinetType: r.filed_type, matterId: r.matter_id, matter: r.filed_matter } : null,
    }),
  );
  return { items, total: Number(total) };
}
