import "server-only";
// Filing decisions: accept, refile, file by hand, confirm an auto-filing, move a filed document.
// Each runs in one transaction that first locks the document's row (SELECT … FOR UPDATE), so
// what it reads (the current place, the latest suggestion) is what it changes: two people
// moving or filing the same document at once are served one after the other, and the second
// is told what happened. Each decision appends one event through lib/data/record.ts.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError, badInput, notFound } from "@/lib/errors";
import { canSeeMatter } from "@/lib/data/catalog";
import { canSeeDocument } from "@/lib/data/document-access";
import { appendFilingEvent, priorFilingOf, type FilingEventAction } from "@/lib/data/record";
import type { CurrentUser } from "@/lib/data/users";

export type FilingAction = "accept" | "refile" | "file" | "confirm" | "move";

export interface FilingInput {
  action: FilingAction;
  cabinetTypeId?: number;
  matterId?: number;
  reason?: string;
  /** For a move: where the person saw the document when they decided (a stale screen is refused). */
  expectedCabinetTypeId?: number;
  expectedMatterId?: number;
}

export interface FilingResult {
  documentId: number;
  cabinetTypeId: number;
  matterId: number;
  filedHow: string;
  eventId: number;
  action: string;
}

export interface DocumentRow {
  id: number;
  status: string;
  filed_by: number | null;
  filed_at: Date | null;
  filed_how: string | null;
  confirmed_by: number | null;
  confirmed_at: Date | null;
  cabinet_type_id: number | null;
  matter_id: number | null;
  disposed_at: Date | null;
}

interface SuggestionRow {
  model_version_id: number | null;
  ranked: string | { cabinetTypeId: number; confidence: number }[];
  top_cabinet_type_id: number | null;
  top_matter_id: number | null;
}

const parse = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

export async function lockDocument(trx: Knex.Transaction, id: number): Promise<DocumentRow> {
  const doc = await trx("documents")
    .where({ id })
    .forUpdate()
    .first("id", "status", "filed_by", "filed_at", "filed_how", "confirmed_by", "confirmed_at", "cabinet_type_id", "matter_id", "disposed_at");
  if (!doc) throw notFound("That document");
  return doc;
}

async function requireCabinetType(trx: Knex.Transaction, id: number | null | undefined): Promise<number> {
  if (!id) throw badInput("Choose a cabinet type.");
  const row = await trx("cabinet_types").where({ id, active: true }).first("id");
  if (!row) throw badInput("That cabinet type does not exist or is no longer in use. Pick another.");
  return id;
}

export async function requireMatter(user: CurrentUser, id: number | null | undefined): Promise<number> {
  if (!id) throw badInput("Choose the matter: Foldwright could not tell it from the document.");
  // A matter behind a wall the user is outside of is answered like one that does not exist.
  if (!(await canSeeMatter(user, id))) throw badInput("That matter does not exist or is not open to you. Pick another.");
  return id;
}

export async function fileDocument(user: CurrentUser, documentId: number, input: FilingInput): Promise<FilingResult> {
  // Behind a wall the user is outside of, the document does not exist for them.
  if (!(await canSeeDocument(user, documentId))) throw notFound("That document");
  return getDb().transaction(async (trx) => {
    const doc = await lockDocument(trx, documentId);
    if (doc.disposed_at) throw new AppError(409, "disposed", "This document was destroyed under an approved disposal; only its tombstone is left.");
    const priorFiling = priorFilingOf(doc);
    const suggestion: SuggestionRow | undefined = await trx("suggestions").where({ document_id: documentId }).orderBy("id", "desc").first();
    const ranked = suggestion ? parse<{ cabinetTypeId: number; confidence: number }[]>(suggestion.ranked) : [];
    const confidenceOf = (typeId: number | null) => ranked.find((r) => r.cabinetTypeId === typeId)?.confidence ?? null;

    if (input.action === "confirm") {
      if (doc.filed_how !== "auto") throw new AppError(409, "not_auto_filed", "Only an auto-filed document waiting for its spot-check can be confirmed.");
      if (doc.confirmed_at) throw new AppError(409, "already_confirmed", "Someone confirmed this document a moment ago.");
      await trx("documents").where({ id: documentId }).update({ confirmed_by: user.id, confirmed_at: trx.fn.now() });
      const eventId = await appendFilingEvent(trx, {
        documentId, userId: user.id, action: "confirmed",
        fromCabinetTypeId: doc.cabinet_type_id, toCabinetTypeId: doc.cabinet_type_id,
        fromMatterId: doc.matter_id, toMatterId: doc.matter_id,
        modelVersionId: suggestion?.model_version_id ?? null, confidence: confidenceOf(doc.cabinet_type_id),
        reason: input.reason ?? "Spot-check: the auto-filing is right.",
        priorFiling,
      });
      return { documentId, cabinetTypeId: doc.cabinet_type_id!, matterId: doc.matter_id!, filedHow: "auto", eventId, action: "confirmed" };
    }

    let action: FilingEventAction;
    let typeId: number;
    let matterId: number;
    let filedHow: string;
    const moving = input.action === "move" || (doc.filed_how === "auto" && !doc.confirmed_at && input.action === "refile");
    if (moving) {
      if (!doc.filed_at) throw new AppError(409, "not_filed", "This document is not filed yet: accept, refile or file it by hand instead.");
      const stale =
        (input.expectedCabinetTypeId !== undefined && input.expectedCabinetTypeId !== doc.cabinet_type_id) ||
        (input.expectedMatterId !== undefined && input.expectedMatterId !== doc.matter_id);
      if (stale) throw new AppError(409, "moved_meanwhile", "Someone moved this document a moment ago. Open it again to see where it is now, then move it if you still need to.");
      typeId = await requireCabinetType(trx, input.cabinetTypeId ?? doc.cabinet_type_id);
      matterId = await requireMatter(user, input.matterId ?? doc.matter_id);
      if (typeId === doc.cabinet_type_id && matterId === doc.matter_id && doc.filed_how !== "auto") {
        throw badInput("The document is already in that cabinet. Choose another cabinet type or matter.");
      }
      // A spot-check correction is a refile (its reason optional); moving what a person filed says why.
      const spotCheck = doc.filed_how === "auto" && !doc.confirmed_at;
      if (!spotCheck && !input.reason?.trim()) throw badInput("Say in a few words why the document moves (for example: wrong matter).");
      action = "moved";
      filedHow = doc.filed_how === "auto" ? "refiled" : doc.filed_how!; // a person decided: it becomes a training label
    } else {
      if (doc.filed_at) throw new AppError(409, "already_filed", "This document is already filed. Use Move to put it somewhere else.");
      if (input.action === "accept") {
        if (!suggestion?.top_cabinet_type_id) throw new AppError(409, "no_suggestion", "There is no suggestion to accept for this document. File it by hand.");
        typeId = await requireCabinetType(trx, suggestion.top_cabinet_type_id);
        action = "accepted";
      } else if (input.action === "refile") {
        typeId = await requireCabinetType(trx, input.cabinetTypeId);
        action = typeId === suggestion?.top_cabinet_type_id ? "accepted" : "refiled";
      } else {
        typeId = await requireCabinetType(trx, input.cabinetTypeId);
        action = "filed_by_hand";
      }
      matterId = await requireMatter(user, input.matterId ?? suggestion?.top_matter_id);
      filedHow = action === "accepted" ? "accepted" : action === "refiled" ? "refiled" : "by_hand";
    }

    await trx("documents")
      .where({ id: documentId })
      .update({
        cabinet_type_id: typeId,
        matter_id: matterId,
        filed_by: user.id,
        filed_at: trx.fn.now(),
        filed_how: filedHow,
        ...(moving && doc.filed_how === "auto" ? { confirmed_by: user.id, confirmed_at: trx.fn.now() } : {}),
      });
    const eventId = await appendFilingEvent(trx, {
      documentId,
      userId: user.id,
      action,
      fromCabinetTypeId: doc.filed_at ? doc.cabinet_type_id : suggestion?.top_cabinet_type_id ?? null,
      toCabinetTypeId: typeId,
      fromMatterId: doc.filed_at ? doc.matter_id : suggestion?.top_matter_id ?? null,
      toMatterId: matterId,
      modelVersionId: suggestion?.model_version_id ?? null,
      confidence: confidenceOf(typeId),
      reason: input.reason?.trim() || null,
      priorFiling,
    });
    return { documentId, cabinetTypeId: typeId, matterId, filedHow, eventId, action };
  });
}
