// The one writer of the filing record (filing_events) and of the ethical wall's links
// (document_matter_links). Every decision — suggestion, accept, refile, file by hand, auto-file,
// confirm, move, undo, import, disposal — appends its event here, inside the caller's
// transaction, and every matter the event names is linked to the document in the same
// transaction, so the wall can never lag behind the record.
//
// No "server-only" import: the demo seed (run by tsx outside React's server build) writes its
// history through this module too. It takes the caller's Knex or transaction and reads no session.
import type { Knex } from "knex";

export const FILING_ACTIONS = [
  "suggested",
  "accepted",
  "refiled",
  "filed_by_hand",
  "auto_filed",
  "confirmed",
  "moved",
  "undone",
  "imported",
  "disposed",
] as const;
export type FilingEventAction = (typeof FILING_ACTIONS)[number];

/** How a document came to be linked to a matter (the first link of each pair is kept). */
export type LinkHow = "filed" | "suggested" | "candidate" | "moved" | "imported";

export interface NewFilingEvent {
  documentId: number;
  userId: number | null; // null: Foldwright itself
  action: FilingEventAction;
  fromCabinetTypeId?: number | null;
  toCabinetTypeId?: number | null;
  fromMatterId?: number | null;
  toMatterId?: number | null;
  modelVersionId?: number | null;
  confidence?: number | null;
  reason?: string | null;
  /** For an "undone" event: the event it reverses (each event can be reversed once). */
  reversesEventId?: number | null;
  /** Where the document stood before this decision, so an undo can put exactly that back. */
  priorFiling?: PriorFiling | null;
  /** Only for history written after the fact (the demo seed); otherwise the database clock. */
  createdAt?: Date;
}

/** A document's filing as it stood before a decision (all null while it waits in To review). */
export interface PriorFiling {
  cabinetTypeId: number | null;
  matterId: number | null;
  filedBy: number | null;
  filedAt: string | null; // ISO 8601
  filedHow: string | null;
  confirmedBy: number | null;
  confirmedAt: string | null;
}

interface FilingColumns {
  cabinet_type_id: number | null;
  matter_id: number | null;
  filed_by?: number | null;
  filed_at: Date | string | null;
  filed_how: string | null;
  confirmed_by?: number | null;
  confirmed_at: Date | string | null;
}

const iso = (v: Date | string | null | undefined) => (v === null || v === undefined ? null : new Date(v).toISOString());

/** The snapshot of a locked document row's filing columns, for `priorFiling`. */
export function priorFilingOf(doc: FilingColumns): PriorFiling {
  return {
    cabinetTypeId: doc.cabinet_type_id ?? null,
    matterId: doc.matter_id ?? null,
    filedBy: doc.filed_by ?? null,
    filedAt: iso(doc.filed_at),
    filedHow: doc.filed_how ?? null,
    confirmedBy: doc.confirmed_by ?? null,
    confirmedAt: iso(doc.confirmed_at),
  };
}

/** The document columns that put a snapshot back (what an undo writes). */
export function filingColumnsOf(p: PriorFiling): Record<string, unknown> {
  const date = (v: string | null) => (v ? new Date(v) : null);
  return {
    cabinet_type_id: p.cabinetTypeId,
    matter_id: p.matterId,
    filed_by: p.filedBy,
    filed_at: date(p.filedAt),
    filed_how: p.filedHow,
    confirmed_by: p.confirmedBy,
    confirmed_at: date(p.confirmedAt),
  };
}

const REASON_MAX = 600;

const LINK_OF: Partial<Record<FilingEventAction, LinkHow>> = { suggested: "suggested", moved: "moved", undone: "moved", imported: "imported" };

export async function linkDocumentToMatters(db: Knex | Knex.Transaction, documentId: number, links: { matterId: number; how: LinkHow }[]): Promise<void> {
  const rows = links.filter((l) => Number.isInteger(l.matterId) && l.matterId > 0).map((l) => ({ document_id: documentId, matter_id: l.matterId, how: l.how }));
  if (rows.length) await db("document_matter_links").insert(rows).onConflict(["document_id", "matter_id"]).ignore();
}

/** The matters an event links its document to, and the row it writes: one shape for one and many. */
function eventLinks(e: NewFilingEvent): { matterId: number; how: LinkHow }[] {
  if (!FILING_ACTIONS.includes(e.action)) throw new Error(`Unknown filing action "${e.action}".`);
  const how = LINK_OF[e.action] ?? "filed";
  return [e.fromMatterId, e.toMatterId].filter((m): m is number => !!m).map((matterId) => ({ matterId, how }));
}

function eventRow(e: NewFilingEvent) {
  return {
    document_id: e.documentId,
    user_id: e.userId,
    action: e.action,
    from_cabinet_type_id: e.fromCabinetTypeId ?? null,
    to_cabinet_type_id: e.toCabinetTypeId ?? null,
    from_matter_id: e.fromMatterId ?? null,
    to_matter_id: e.toMatterId ?? null,
    model_version_id: e.modelVersionId ?? null,
    confidence: e.confidence ?? null,
    reason: e.reason ? e.reason.slice(0, REASON_MAX) : null,
    reverses_event_id: e.reversesEventId ?? null,
    prior_filing: e.priorFiling ? JSON.stringify(e.priorFiling) : null,
    ...(e.createdAt ? { created_at: e.createdAt } : {}),
  };
}

export async function appendFilingEvent(db: Knex | Knex.Transaction, e: NewFilingEvent): Promise<number> {
  await linkDocumentToMatters(db, e.documentId, eventLinks(e));
  const [id] = await db("filing_events").insert(eventRow(e));
  return Number(id);
}

/**
 * Many events at once (bulk writers such as the scale benchmark's filing of generated documents):
 * the same checks, links and rows as appendFilingEvent, in two multi-row inserts.
 */
export async function appendFilingEvents(db: Knex | Knex.Transaction, events: NewFilingEvent[]): Promise<void> {
  if (events.length === 0) return;
  const links = events.flatMap((e) =>
    eventLinks(e)
      .filter((l) => Number.isInteger(l.matterId) && l.matterId > 0)
      .map((l) => ({ document_id: e.documentId, matter_id: l.matterId, how: l.how })),
  );
  if (links.length) await db("document_matter_links").insert(links).onConflict(["document_id", "matter_id"]).ignore();
  await db("filing_events").insert(events.map(eventRow));
}
