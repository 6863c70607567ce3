import "server-only";
// Intake: keep the original first, then commit the row. Either nothing is left behind, or a
// complete row whose original is safe in the bucket — never a row without its file.
import crypto from "node:crypto";
import type { Knex } from "knex";
import fs from "node:fs";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { cleanFileName, sha256Hex, sniffFile, type IntakeError } from "@/lib/intake";
import { enqueueJob } from "@/lib/data/jobs";
import { documentsWithMatters, whereDocumentVisible } from "@/lib/data/document-access";
import type { CurrentUser } from "@/lib/data/users";
import { isDatabaseUnavailable } from "@/db/errors";
import { deleteObject, isStorageUnavailable, putObject } from "@/storage/s3";
import { RESTRICTED_NOTE } from "@/lib/data/documents";
import { READ_JOB } from "@/lib/jobs/kinds";
import type { SpooledFile } from "@/lib/intake/spool-upload";

export interface DuplicateOf {
  id: number | null; // null when the earlier copy sits in a matter this user may not see
  message: string;
}

export type UploadResult =
  | { name: string; status: "reading"; id: number; httpStatus: 201 }
  | { name: string; status: "duplicate"; duplicateOf: DuplicateOf; httpStatus: 200 }
  | { name: string; status: "rejected"; error: { code: string; message: string }; httpStatus: number };

export const STORAGE_DOWN = "The document store is not answering, so this file was not saved. Nothing was kept; try again in a minute, and tell your admin if it keeps happening.";
export const DATABASE_DOWN = "The database is not answering, so this file was not saved. Nothing was kept; try again in a minute, and tell your admin if it keeps happening.";

export const STORAGE_REFUSED = "The document store refused this file, so it was not saved. Nothing was kept; tell your admin (the server log has the store's answer).";
const DATABASE_FAILED = "Foldwright could not save this file because of a problem on our side. Nothing was kept; tell your admin (the server log has the cause).";

/** Logs the cause and answers 503 only when the database is really not answering. */
function databaseFailure(doing: string, e: unknown): AppError {
  console.error(`intake: ${doing} failed:`, e);
  return isDatabaseUnavailable(e)
    ? new AppError(503, "database_unavailable", DATABASE_DOWN)
    : new AppError(500, "database_error", DATABASE_FAILED);
}

function rejected(name: string, error: IntakeError | AppError | { status: number; code: string; message: string }): UploadResult {
  return { name, status: "rejected", error: { code: error.code, message: error.message }, httpStatus: error.status };
}

function when(d: Date): string {
  return `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

async function describeDuplicate(user: CurrentUser, sha256: string): Promise<DuplicateOf | null> {
  const db = getDb();
  const row = await documentsWithMatters(db)
    .leftJoin("users as u", "u.id", "d.uploaded_by")
    .leftJoin("cabinet_types as c", "c.id", "d.cabinet_type_id")
    .where("d.sha256", sha256)
    .whereNull("d.disposed_at") // a tombstone's file is gone: the same file may be kept again
    .first("d.id", "d.original_name", "d.uploaded_at", "d.status", "u.name as uploader", "m.number as matter", "m.restricted", "c.name as cabinet");
  if (!row) return null;
  const visible = await whereDocumentVisible(documentsWithMatters(db).where("d.id", row.id), user).first("d.id");
  if (!visible) {
    // Nothing of the walled copy — no name, number, matter or date — only that it is held.
    return { id: null, message: `This exact file is already held and was not stored again. ${RESTRICTED_NOTE}` };
  }
  const where = row.matter
    ? `It is filed in ${row.matter}${row.cabinet ? ` › ${row.cabinet}` : ""}.`
    : "It is not filed yet.";
  return {
    id: row.id,
    message: `This exact file is already held as document #${row.id} ("${row.original_name}"), which came in on ${when(new Date(row.uploaded_at))} from ${row.uploader}. ${where} It was not stored again.`,
  };
}

function isDuplicateKey(e: unknown): boolean {
  return typeof e === "object" && e !== null && (e as { code?: string }).code === "ER_DUP_ENTRY";
}

export interface StoreOptions {
  /** Runs in the row's own transaction (an archive import records which document its file became). */
  withRow?: (trx: Knex.Transaction, documentId: number) => Promise<void>;
}

/** Keeps one file: its bytes (mail intake, imports), or a file a streamed upload spooled to disk. */
export async function storeUpload(user: CurrentUser, rawName: string, source: Uint8Array | SpooledFile, options: StoreOptions = {}): Promise<UploadResult> {
  const name = cleanFileName(rawName);
  const spooled = source instanceof Uint8Array ? null : source;
  const sniff = await sniffFile(source, name, { maxBytes: env.uploadMaxBytes });
  if (!sniff.ok) return rejected(name, sniff.error);
  const sha256 = spooled ? spooled.sha256 : sha256Hex(source as Uint8Array);
  const size = spooled ? spooled.size : (source as Uint8Array).byteLength;

  const known = await describeDuplicate(user, sha256).catch((e) => {
    throw databaseFailure("checking for a duplicate", e);
  });
  if (known) return { name, status: "duplicate", duplicateOf: known, httpStatus: 200 };

  const now = new Date();
  const key = `originals/${now.getUTCFullYear()}/${String(now.getUTCMonth() + 1).padStart(2, "0")}/${crypto.randomUUID()}`;
  try {
    await putObject(key, spooled ? fs.createReadStream(spooled.path) : Buffer.from(source as Uint8Array), {
      contentLength: size,
      contentType: sniff.mediaType,
      metadata: { sha256, "original-name": encodeURIComponent(name), "uploaded-by": String(user.id) },
    });
  } catch (e) {
    console.error(`intake: storing the original of "${name}" failed:`, e);
    // Whatever the store answered, nothing was kept and the object may be half-written.
    await deleteObject(key).catch(() => {});
    if (isStorageUnavailable(e)) return rejected(name, { status: 503, code: "storage_unavailable", message: STORAGE_DOWN });
    return rejected(name, { status: 500, code: "storage_refused", message: STORAGE_REFUSED });
  }

  try {
    const id = await getDb().transaction(async (trx) => {
      const [docId] = await trx("documents").insert({
        sha256,
        original_name: name,
        media_type: sniff.mediaType,
        size_bytes: size,
        storage_key: key,
        status: "reading",
        uploaded_by: user.id,
      });
      await enqueueJob(READ_JOB, docId, null, trx);
      await options.withRow?.(trx, docId);
      return docId as number;
    });
    return { name, status: "reading", id, httpStatus: 201 };
  } catch (e) {
    // The row did not commit: remove the object so nothing is half-stored.
    await deleteObject(key).catch((err) => console.error(`intake: could not remove orphan ${key}:`, err));
    if (isDuplicateKey(e)) {
      const winner = await describeDuplicate(user, sha256);
      if (winner) return { name, status: "duplicate", duplicateOf: winner, httpStatus: 200 };
    }
    const failure = databaseFailure(`saving the row of "${name}"`, e);
    return rejected(name, failure);
  }
}
