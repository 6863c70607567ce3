import "server-only";
// Filing decisions: accept, refile, file by hand, confirm an auto-filing, move a filed document.
// Each writes one row of the append-only filing record in the same transaction.
import { getDb } from "@/db";
import { AppError, badInput } from "@/lib/errors";
import { canSeeMatter } from "@/lib/data/catalog";
import { documentsWithMatters, whereDocumentVisible } from "@/lib/data/document-access";
import { appendFilingEvent, type FilingEventAction } from "@/lib/data/record";
import type { CurrentUser } from "@/lib/data/users";

export type FilingAction = "accept" | "refile" | "file" | "confirm" | "move";

export interface FilingInput {
  action: FilingAction;
  cabinetTypeId?: number;
  matterId?: number;
  reason?: string;
}

export interface FilingResult {
  documentId: number;
  cabinetTypeId: number;
  matterId: number;
  filedHow: string;
  eventId: number;
  action: string;
}

interface SuggestionRow {
  model_version_id: number | null;
  ranked: string | { cabinetTypeId: number; confidence: number }[];
  top_cabinet_type_id: number | null;
  top_matter_id: number | null;
}

const parse = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

async function requireVisibleDocument(user: CurrentUser, id: number) {
  const db = getDb();
  const doc = await whereDocumentVisible(documentsWithMatters(db).where("d.id", id), user).first(
    "d.id",
    "d.status",
    "d.filed_at",
    "d.filed_how",
    "d.confirmed_at",
    "d.cabinet_type_id",
    "d.matter_id",
  );
  if (doc) return doc;
  const exists = await db("documents").where({ id }).first("id");
  if (!exists) throw new AppError(404, "not_found", "That document was not found. It may have been removed.");
  throw new AppError(403, "restricted_matter", "This document is in a restricted matter you are not on. Ask an admin or the matter's partner.");
}

async function requireCabinetType(id: number | undefined): Promise<number> {
  if (!id) throw badInput("Choose a cabinet type.");
  const row = await getDb()("cabinet_types").where({ id, active: true }).first("id");
  if (!row) throw badInput("That cabinet type does not exist or is no longer in use. Pick another.");
  return id;
}

async function requireMatter(user: CurrentUser, id: number | null | undefined): Promise<number> {
  if (!id) throw badInput("Choose the matter: Foldwright could not tell it from the document.");
  if (!(await canSeeMatter(user, id))) throw new AppError(403, "restricted_matter", "You are not on that restricted matter's team, so you cannot file into it.");
  return id;
}

export async function fileDocument(user: CurrentUser, documentId: number, input: FilingInput): Promise<FilingResult> {
  const doc = await requireVisibleDocument(user, documentId);
  const db = getDb();
  const suggestion: SuggestionRow | undefined = await db("suggestions").where({ document_id: documentId }).orderBy("id", "desc").first();
  const ranked = suggestion ? parse<{ cabinetTypeId: number; confidence: number }[]>(suggestion.ranked) : [];
  const confidenceOf = (typeId: number) => ranked.find((r) => r.cabinetTypeId === typeId)?.confidence ?? null;

  let action: FilingEventAction;
  let typeId: number;
  let matterId: number;
  let filedHow: string;
  const fromType = doc.filed_at ? doc.cabinet_type_id : suggestion?.top_cabinet_type_id ?? null;
  const fromMatter = doc.filed_at ? doc.matter_id : suggestion?.top_matter_id ?? null;

  if (input.action === "confirm") {
    if (doc.filed_how !== "auto" || doc.confirmed_at) throw new AppError(409, "not_auto_filed", "Only an auto-filed document waiting for its spot-check can be confirmed.");
    const n = await db.transaction(async (trx) => {
      const updated = await trx("documents").where({ id: documentId }).whereNull("confirmed_at").update({ confirmed_by: user.id, confirmed_at: trx.fn.now() });
      if (!updated) return 0;
      return appendFilingEvent(trx, {
        documentId, userId: user.id, action: "confirmed",
        fromCabinetTypeId: doc.cabinet_type_id, toCabinetTypeId: doc.cabinet_type_id,
        fromMatterId: doc.matter_id, toMatterId: doc.matter_id,
        modelVersionId: suggestion?.model_version_id ?? null, confidence: confidenceOf(doc.cabinet_type_id),
        reason: input.reason ?? "Spot-check: the auto-filing is right.",
      });
    });
    if (!n) throw new AppError(409, "already_confirmed", "Someone confirmed this document a moment ago.");
    return { documentId, cabinetTypeId: doc.cabinet_type_id, matterId: doc.matter_id, filedHow: "auto", eventId: n, action: "confirmed" };
  }

  if (input.action === "move" || (doc.filed_how === "auto" && !doc.confirmed_at && input.action === "refile")) {
    if (!doc.filed_at) throw new AppError(409, "not_filed", "This document is not filed yet: accept, refile or file it by hand instead.");
    typeId = await requireCabinetType(input.cabinetTypeId ?? doc.cabinet_type_id);
    matterId = await requireMatter(user, input.matterId ?? doc.matter_id);
    action = "moved";
    filedHow = doc.filed_how === "auto" ? "refiled" : doc.filed_how; // a person decided: it becomes a training label
  } else {
    if (doc.filed_at) throw new AppError(409, "already_filed", "This document is already filed. Use Move to put it somewhere else.");
    if (input.action === "accept") {
      if (!suggestion?.top_cabinet_type_id) throw new AppError(409, "no_suggestion", "There is no suggestion to accept for this document. File it by hand.");
      typeId = await requireCabinetType(suggestion.top_cabinet_type_id);
      action = "accepted";
    } else if (input.action === "refile") {
      typeId = await requireCabinetType(input.cabinetTypeId);
      action = typeId === suggestion?.top_cabinet_type_id ? "accepted" : "refiled";
    } else {
      typeId = await requireCabinetType(input.cabinetTypeId);
      action = "filed_by_hand";
    }
    matterId = await requireMatter(user, input.matterId ?? suggestion?.top_matter_id);
    filedHow = action === "accepted" ? "accepted" : action === "refiled" ? "refiled" : "by_hand";
  }

  const eventId = await db.transaction(async (trx) => {
    const q = trx("documents").where({ id: documentId });
    if (action !== "moved") q.whereNull("filed_at");
    const n = await q.update({
      cabinet_type_id: typeId,
      matter_id: matterId,
      filed_by: user.id,
      filed_at: trx.fn.now(),
      filed_how: filedHow,
      ...(action === "moved" && doc.filed_how === "auto" ? { confirmed_by: user.id, confirmed_at: trx.fn.now() } : {}),
    });
    if (!n) return 0;
    return appendFilingEvent(trx, {
      documentId,
      userId: user.id,
      action,
      fromCabinetTypeId: fromType,
      toCabinetTypeId: typeId,
      fromMatterId: fromMatter,
      toMatterId: matterId,
      modelVersionId: suggestion?.model_version_id ?? null,
      confidence: confidenceOf(typeId),
      reason: input.reason ?? null,
    });
  });
  if (!eventId) throw new AppError(409, "already_filed", "Someone filed this document a moment ago. Open it to see where.");
  return { documentId, cabinetTypeId: typeId, matterId, filedHow, eventId, action };
}
