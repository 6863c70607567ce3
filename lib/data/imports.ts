import "server-only";
// Archive imports: what was found, the proposal, the admin's confirmation, and the state a
// person comes back to. The work itself is the "import" job (lib/data/import-run.ts); each file
// becomes a document through Intake's own storeUpload and is filed as "imported" once read
// (lib/data/import-settle.ts), on the record through lib/data/record.ts.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { can } from "@/lib/auth/permissions";
import { AppError, badInput, notAllowed, notFound } from "@/lib/errors";
import { enqueueJob } from "@/lib/data/jobs";
import { whereMatterVisible } from "@/lib/data/document-access";
import { appendSetupEvent } from "@/lib/data/setup-record";
import type { CurrentUser } from "@/lib/data/users";
import { countFolders, isSystemEntry, placeFiles, type ArchiveFile } from "@/lib/imports/archive-folders";
import { proposeMapping, type FolderProposal } from "@/lib/imports/propose-mapping";
import type { ImportMapping } from "@/lib/validations/imports";
import { IMPORT_JOB } from "@/lib/jobs/kinds";

export type ImportState = "proposed" | "importing" | "reading" | "done" | "failed";
export type ImportFileState = "waiting" | "reading" | "filed" | "unreadable" | "duplicate" | "rejected" | "skipped";
export const SETTLED: ImportFileState[] = ["filed", "unreadable", "duplicate", "rejected", "skipped"];

export interface SourceFile extends ArchiveFile {
  position: number;
  stagingKey?: string | null;
  /** A problem known before the file is read (an encrypted zip entry, a part over the limit). */
  problem?: { code: string; message: string };
}

export interface ImportFileView {
  id: number;
  path: string;
  typeFolder: string | null;
  matterFolder: string | null;
  sizeBytes: number;
  state: ImportFileState;
  documentId: number | null;
  code: string | null;
  message: string | null;
}

export interface ImportView {
  id: number;
  state: ImportState;
  sourceName: string;
  sourceKind: "zip" | "folder";
  sizeBytes: number;
  createdAt: string;
  createdBy: string;
  confirmedAt: string | null;
  finishedAt: string | null;
  folders: FolderProposal[];
  /** Files at the top level, outside any folder: they are not imported. */
  looseFiles: number;
  mapping: ImportMapping | null;
  counts: Record<ImportFileState, number> & { total: number };
  modelVersionId: number | null;
  error: string | null;
  files: ImportFileView[];
}

function requireImporter(user: CurrentUser): void {
  if (!can(user.role, "setup.manage")) throw notAllowed("import an archive");
}

const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

export const TOP_LEVEL_MESSAGE =
  "This file is at the top level of the archive, outside any folder, so Foldwright cannot tell its cabinet type. Put it in a cabinet type's folder and import it again, or upload it at Intake.";

/** Records what a received archive holds and proposes a mapping; returns the import's id. */
export async function createImport(
  user: CurrentUser,
  source: { kind: "zip" | "folder"; name: string; sizeBytes: number; storageKey: string | null; files: SourceFile[] },
): Promise<number> {
  requireImporter(user);
  const files = source.files.filter((f) => !isSystemEntry(f.path));
  if (files.length === 0) {
    throw badInput("This archive holds no files. Zip the folder that holds your cabinet-type folders and upload that.");
  }
  const placed = placeFiles(files);
  const db = getDb();
  const types = await db("cabinet_types").where({ active: true }).select("id", "name");
  const matters = await whereMatterVisible(db("matters as m").select("m.id", "m.number", "m.title"), user);
  const folders = proposeMapping(countFolders(placed), types, matters);
  return db.transaction(async (trx) => {
    const [id] = await trx("imports").insert({
      created_by: user.id,
      source_name: source.name.slice(0, 255),
      source_kind: source.kind,
      storage_key: source.storageKey,
      size_bytes: source.sizeBytes,
      state: "proposed",
      folders: JSON.stringify({ folders, looseFiles: placed.filter((p) => !p.typeFolder).length }),
    });
    const rows = placed.map((p, i) => {
      const f = files[i];
      const loose = !p.typeFolder;
      return {
        import_id: id,
        position: f.position,
        path: p.relative.slice(0, 1000),
        type_folder: p.typeFolder,
        matter_folder: p.matterFolder,
        size_bytes: p.size,
        staging_key: f.stagingKey ?? null,
        state: loose ? "skipped" : f.problem ? "rejected" : "waiting",
        code: loose ? "top_level" : f.problem?.code ?? null,
        message: loose ? TOP_LEVEL_MESSAGE : f.problem?.message ?? null,
      };
    });
    for (let i = 0; i < rows.length; i += 500) await trx("import_files").insert(rows.slice(i, i + 500));
    return Number(id);
  });
}

export async function getImport(user: CurrentUser, id: number, db: Knex = getDb()): Promise<ImportView> {
  requireImporter(user);
  const row = await db("imports as i").join("users as u", "u.id", "i.created_by").where("i.id", id).first("i.*", "u.name as creator");
  if (!row) throw notFound("That import");
  const files = await db("import_files").where({ import_id: id }).orderBy("position").select();
  const counts = { total: files.length, waiting: 0, reading: 0, filed: 0, unreadable: 0, duplicate: 0, rejected: 0, skipped: 0 } as ImportView["counts"];
  for (const f of files) counts[f.state as ImportFileState] += 1;
  const found = json<{ folders: FolderProposal[]; looseFiles: number }>(row.folders);
  return {
    id: row.id,
    state: row.state,
    sourceName: row.source_name,
    sourceKind: row.source_kind,
    sizeBytes: Number(row.size_bytes),
    createdAt: new Date(row.created_at).toISOString(),
    createdBy: row.creator,
    confirmedAt: row.confirmed_at ? new Date(row.confirmed_at).toISOString() : null,
    finishedAt: row.finished_at ? new Date(row.finished_at).toISOString() : null,
    folders: found.folders,
    looseFiles: found.looseFiles,
    mapping: row.mapping ? json<ImportMapping>(row.mapping) : null,
    counts,
    modelVersionId: row.model_version_id ?? null,
    error: row.error ?? null,
    files: files.map((f) => ({
      id: f.id,
      path: f.path,
      typeFolder: f.type_folder,
      matterFolder: f.matter_folder,
      sizeBytes: Number(f.size_bytes),
      state: f.state,
      documentId: f.document_id,
      code: f.code,
      message: f.message,
    })),
  };
}

export interface ImportListItem {
  id: number;
  sourceName: string;
  state: ImportState;
  createdAt: string;
  createdBy: string;
  files: number;
  settled: number;
}

export async function listImports(user: CurrentUser, limit = 50): Promise<ImportListItem[]> {
  requireImporter(user);
  const rows = await getDb()("imports as i")
    .join("users as u", "u.id", "i.created_by")
    .leftJoin("import_files as f", "f.import_id", "i.id")
    .groupBy("i.id", "i.source_name", "i.state", "i.created_at", "u.name")
    .orderBy("i.id", "desc")
    .limit(limit)
    .select("i.id", "i.source_name", "i.state", "i.created_at", "u.name as creator")
    .count({ files: "f.id" })
    .select(getDb().raw("SUM(f.state IN (?, ?, ?, ?, ?)) AS settled", SETTLED));
  return rows.map((r: Record<string, unknown>) => ({
    id: Number(r.id),
    sourceName: String(r.source_name),
    state: r.state as ImportState,
    createdAt: new Date(r.created_at as string).toISOString(),
    createdBy: String(r.creator),
    files: Number(r.files),
    settled: Number(r.settled ?? 0),
  }));
}

/** Default retention of a cabinet type an import creates: kept for good until an admin sets a rule (keeping too long is the safer mistake). */
const NEW_TYPE_RETENTION = { retention_years: null, retention_trigger: "permanent", retention_source: "Set by an archive import; review it in Setup › Cabinet types." };

/**
 * Checks the mapping against the folders found and what exists, creates the new cabinet types
 * (each on the setup record), stores the mapping and queues the import job. Once only.
 */
export async function confirmImport(user: CurrentUser, id: number, mapping: ImportMapping): Promise<ImportView> {
  requireImporter(user);
  const db = getDb();
  await db.transaction(async (trx) => {
    const row = await trx("imports").where({ id }).forUpdate().first("id", "state", "folders");
    if (!row) throw notFound("That import");
    if (row.state !== "proposed") throw new AppError(409, "already_confirmed", "This import was already confirmed; its files are being brought in. Open it to see where it stands.");
    const found = json<{ folders: FolderProposal[] }>(row.folders).folders;
    const names = new Set(found.map((f) => f.name));
    const given = new Map(mapping.folders.map((f) => [f.name, f]));
    for (const f of mapping.folders) if (!names.has(f.name)) throw badInput(`There is no folder "${f.name}" in this archive. Map the folders the import found.`);
    const missing = found.filter((f) => !given.has(f.name)).map((f) => f.name);
    if (missing.length) throw badInput(`Say where the folder${missing.length > 1 ? "s" : ""} ${missing.map((m) => `"${m}"`).join(", ")} go${missing.length > 1 ? "" : "es"}: an existing cabinet type, a new one, or skip.`);

    const matterIds = [mapping.defaultMatterId, ...mapping.matters.map((m) => m.matterId).filter((m): m is number => m !== null)];
    const visible = await whereMatterVisible(trx("matters as m").whereIn("m.id", matterIds), user).pluck("m.id");
    for (const m of matterIds) if (!visible.includes(m)) throw badInput("A matter in the mapping does not exist. Pick the matters again.");

    const resolved: ImportMapping["folders"] = [];
    for (const f of mapping.folders) {
      if (f.action === "existing") {
        const type = await trx("cabinet_types").where({ id: f.cabinetTypeId, active: true }).first("id");
        if (!type) throw badInput(`The cabinet type chosen for "${f.name}" does not exist or is retired. Pick another, or create a new one.`);
        resolved.push(f);
      } else if (f.action === "new") {
        const existing = await trx("cabinet_types").whereRaw("LOWER(name) = LOWER(?)", [f.newName]).first("id", "active");
        if (existing?.active) {
          resolved.push({ name: f.name, action: "existing", cabinetTypeId: existing.id });
          continue;
        }
        if (existing) throw new AppError(409, "duplicate_name", `A retired cabinet type is named "${f.newName}". Restore it in Setup › Cabinet types, or choose another name.`);
        const description = `Imported from the folder "${f.name}".`;
        const [typeId] = await trx("cabinet_types").insert({ name: f.newName, description, keywords: JSON.stringify([]), ...NEW_TYPE_RETENTION, active: true });
        await appendSetupEvent(trx, {
          userId: user.id,
          entity: "cabinet_type",
          entityId: Number(typeId),
          action: "created",
          after: { name: f.newName, description, keywords: [], retentionYears: null, retentionTrigger: "permanent", retentionSource: NEW_TYPE_RETENTION.retention_source, active: true },
          reason: `Created for the archive import #${id}.`,
        });
        resolved.push({ name: f.name, action: "existing", cabinetTypeId: Number(typeId) });
      } else resolved.push(f);
    }
    const skip = resolved.filter((f) => f.action === "skip").map((f) => f.name);
    if (skip.length) {
      await trx("import_files").where({ import_id: id, state: "waiting" }).whereIn("type_folder", skip).update({
        state: "skipped",
        code: "skipped",
        message: "Its folder was set to be skipped in this import. Import it again, or upload it at Intake, if it should be kept.",
      });
    }
    await trx("imports").where({ id }).update({
      state: "importing",
      mapping: JSON.stringify({ ...mapping, folders: resolved }),
      confirmed_by: user.id,
      confirmed_at: trx.fn.now(3),
    });
    await enqueueJob(IMPORT_JOB, null, { importId: id }, trx);
  });
  return getImport(user, id);
}
