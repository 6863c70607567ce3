import "server-only";
// Files an imported document once it has been read, in the reading's own transaction: the
// folder's cabinet type and matter, filed "imported" by the admin who confirmed the import, on
// the record through lib/data/record.ts. A file the reader finds unreadable (password, damage, a
// zip bomb) is kept, as at Intake, but not filed: it waits in To review to be filed by hand.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { appendFilingEvent } from "@/lib/data/record";
import type { ImportMapping } from "@/lib/validations/imports";

const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

export type ReadingFate = { ready: true } | { ready: false; code: string; reason: string };

/** Where a file of the import goes under the confirmed mapping (null: its folder is skipped). */
export function placeOf(mapping: ImportMapping, typeFolder: string | null, matterFolder: string | null): { cabinetTypeId: number; matterId: number } | null {
  const folder = mapping.folders.find((f) => f.name === typeFolder);
  if (!folder || folder.action !== "existing") return null;
  const matter = matterFolder ? mapping.matters.find((m) => m.name === matterFolder)?.matterId : null;
  return { cabinetTypeId: folder.cabinetTypeId, matterId: matter ?? mapping.defaultMatterId };
}

/** Returns the import's id when the document came from one (then no suggestion is needed). */
export async function settleImportedReading(trx: Knex.Transaction, documentId: number, fate: ReadingFate): Promise<number | null> {
  const file = await trx("import_files as f")
    .join("imports as i", "i.id", "f.import_id")
    .where({ "f.document_id": documentId, "f.state": "reading" })
    .forUpdate()
    .first("f.id", "f.import_id", "f.path", "f.type_folder", "f.matter_folder", "i.mapping", "i.confirmed_by", "i.source_name");
  if (!file) return null;
  if (!fate.ready) {
    await trx("import_files").where({ id: file.id }).update({ state: "unreadable", code: fate.code, message: fate.reason.slice(0, 800), updated_at: trx.fn.now(3) });
    return file.import_id;
  }
  const place = placeOf(json<ImportMapping>(file.mapping), file.type_folder, file.matter_folder);
  if (!place) {
    await trx("import_files").where({ id: file.id }).update({ state: "skipped", code: "skipped", updated_at: trx.fn.now(3) });
    return file.import_id;
  }
  await trx("documents").where({ id: documentId }).whereNull("filed_at").update({
    cabinet_type_id: place.cabinetTypeId,
    matter_id: place.matterId,
    filed_by: file.confirmed_by,
    filed_at: trx.fn.now(),
    filed_how: "imported",
  });
  await appendFilingEvent(trx, {
    documentId,
    userId: file.confirmed_by,
    action: "imported",
    toCabinetTypeId: place.cabinetTypeId,
    toMatterId: place.matterId,
    reason: `Imported from "${file.source_name}" › ${file.path}`,
  });
  await trx("import_files").where({ id: file.id }).update({ state: "filed", updated_at: trx.fn.now(3) });
  return file.import_id;
}

/**
 * Marks the import done when its last file has settled (once: one UPDATE decides); returns the
 * admin to attribute the retraining to, or null when it is not finished (or was finished already).
 */
export async function finishImportIfSettled(importId: number): Promise<{ confirmedBy: number; filed: number } | null> {
  const db = getDb();
  const changed = await db("imports")
    .where({ id: importId, state: "reading" })
    .whereNotExists(db("import_files").where("import_id", importId).whereIn("state", ["waiting", "reading"]).select(db.raw("1")))
    .update({ state: "done", finished_at: db.fn.now(3), storage_key: null });
  if (!changed) return null;
  const row = await db("imports").where({ id: importId }).first("confirmed_by");
  const [{ filed }] = await db("import_files").where({ import_id: importId, state: "filed" }).count({ filed: "*" });
  return { confirmedBy: row.confirmed_by, filed: Number(filed) };
}

export async function recordImportRetrain(importId: number, versionId: number): Promise<void> {
  await getDb()("imports").where({ id: importId }).update({ model_version_id: versionId });
}

/** After every retry failed: the import says why; files already stored stay stored and filed. */
export async function failImport(importId: number, reason: string): Promise<void> {
  await getDb()("imports").where({ id: importId }).whereIn("state", ["importing", "reading"]).update({ state: "failed", error: reason.slice(0, 600), finished_at: getDb().fn.now(3) });
}
