import "server-only";
// Undo of a filing decision: a new "undone" event that names the event it reverses and puts the
// document back exactly where that event found it (its `prior_filing`): the To review queue for a
// first filing, the spot-check list for a confirmation, the earlier cabinet for a move. Nothing
// is deleted or changed on the record. Undo is for a slip noticed at once: only the person who
// decided, only the document's latest decision, and only for UNDO_WINDOW_MINUTES; later, a
// mistake is fixed with Move (which says why).
import { getDb } from "@/db";
import { AppError, notFound } from "@/lib/errors";
import { canSeeDocument } from "@/lib/data/document-access";
import { lockDocument } from "@/lib/data/filing";
import { appendFilingEvent, filingColumnsOf, priorFilingOf, type PriorFiling } from "@/lib/data/record";
import type { CurrentUser } from "@/lib/data/users";

/**
 * The screens offer Undo for about half a minute (UNDO_SHOWN_SECONDS in the confirmation
 * component); the server allows longer so that a slow connection or a second look still works.
 * Ten minutes is our own choice, not a standard.
 */
export const UNDO_WINDOW_MINUTES = 10;

/** Decisions a person makes, and so may take back. Suggestions, auto-filings, imports and disposals are not. */
const UNDOABLE = new Set(["accepted", "refiled", "filed_by_hand", "moved", "confirmed"]);

export interface UndoResult {
  documentId: number;
  eventId: number;
  reversedEventId: number;
  /** Where the document is now: null cabinet and matter when it is back in To review. */
  cabinetTypeId: number | null;
  matterId: number | null;
  backTo: "review" | "spot-check" | "filed";
}

interface EventRow {
  id: number;
  document_id: number;
  user_id: number | null;
  action: string;
  to_cabinet_type_id: number | null;
  to_matter_id: number | null;
  prior_filing: unknown;
  created_at: Date;
}

const parse = <T>(v: unknown): T | null => (v === null || v === undefined ? null : ((typeof v === "string" ? JSON.parse(v) : v) as T));
const conflict = (code: string, message: string) => new AppError(409, code, message);

export async function undoFilingEvent(user: CurrentUser, documentId: number, eventId: number, reason?: string): Promise<UndoResult> {
  if (!(await canSeeDocument(user, documentId))) throw notFound("That document");
  return getDb().transaction(async (trx) => {
    const doc = await lockDocument(trx, documentId);
    const event: EventRow | undefined = await trx("filing_events").where({ id: eventId, document_id: documentId }).first();
    if (!event) throw notFound("That decision");
    if (!UNDOABLE.has(event.action)) throw conflict("not_undoable", "Only a person's accept, refile, filing by hand, move or confirmation can be undone.");
    if (event.user_id !== user.id) throw conflict("not_yours", "Only the person who made a decision can undo it. Use Move to put the document somewhere else.");
    if (await trx("filing_events").where({ reverses_event_id: eventId }).first("id")) throw conflict("already_undone", "This decision was undone already.");
    const later = await trx("filing_events").where({ document_id: documentId }).where("id", ">", eventId).whereNot("action", "suggested").first("id");
    if (later) throw conflict("decided_since", "Something else happened to this document since; undo works on its latest decision only. Use Move instead.");
    const ageMs = Date.now() - new Date(event.created_at).getTime();
    if (ageMs > UNDO_WINDOW_MINUTES * 60_000) throw conflict("undo_expired", `Undo is possible for ${UNDO_WINDOW_MINUTES} minutes after a decision. Use Move to put the document somewhere else.`);
    const prior = parse<PriorFiling>(event.prior_filing);
    if (!prior) throw conflict("undo_unknown", "This decision was made before Undo existed, so where the document stood is not on the record. Use Move instead.");
    if (doc.disposed_at) throw conflict("disposed", "This document was destroyed under an approved disposal; nothing can be undone.");

    await trx("documents").where({ id: documentId }).update(filingColumnsOf(prior));
    const undoneId = await appendFilingEvent(trx, {
      documentId,
      userId: user.id,
      action: "undone",
      fromCabinetTypeId: doc.cabinet_type_id,
      toCabinetTypeId: prior.cabinetTypeId,
      fromMatterId: doc.matter_id,
      toMatterId: prior.matterId,
      reason: reason?.trim() || `Undo of event #${eventId} (${event.action.replace(/_/g, " ")}).`,
      reversesEventId: eventId,
      priorFiling: priorFilingOf(doc),
    });
    const backTo = !prior.filedAt ? "review" : prior.filedHow === "auto" && !prior.confirmedAt ? "spot-check" : "filed";
    return { documentId, eventId: undoneId, reversedEventId: eventId, cabinetTypeId: prior.cabinetTypeId, matterId: prior.matterId, backTo };
  });
}

/** Undoes several decisions (a bulk accept); one answer per event, nothing stops at the first refusal. */
export async function undoFilingEvents(user: CurrentUser, eventIds: number[]): Promise<({ eventId: number; ok: true; undo: UndoResult } | { eventId: number; ok: false; error: { code: string; message: string } })[]> {
  const docs = new Map<number, number>(
    (await getDb()("filing_events").whereIn("id", eventIds).select("id", "document_id")).map((r: { id: number; document_id: number }) => [Number(r.id), Number(r.document_id)]),
  );
  const results = [];
  for (const eventId of eventIds) {
    try {
      const documentId = docs.get(eventId);
      if (documentId === undefined) throw notFound("That decision");
      results.push({ eventId, ok: true as const, undo: await undoFilingEvent(user, documentId, eventId) });
    } catch (e) {
      if (!(e instanceof AppError)) throw e;
      results.push({ eventId, ok: false as const, error: { code: e.code, message: e.message } });
    }
  }
  return results;
}
