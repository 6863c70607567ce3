import "server-only";
// The "import" job: brings each waiting file of a confirmed import in through Intake's own
// storeUpload (kind from the bytes, size limit, duplicate check, original first, then its row and
// its read job), one file at a time, so memory holds one file however large the archive. Each
// file's fate is written as it happens, so the page shows progress and a restarted job (another
// worker, after a crash) goes on from the first file still waiting. Filing happens when a file
// has been read (lib/data/import-settle.ts).
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { completeJob } from "@/lib/data/jobs";
import { storeUpload, type UploadResult } from "@/lib/data/intake";
import type { CurrentUser } from "@/lib/data/users";
import { checkFileSize } from "@/lib/intake";
import { eachZipEntry, type EntryOutcome } from "@/lib/imports/read-zip";
import { deleteObject, getObjectBytes, getObjectStream } from "@/storage/s3";

export const ENTRY_SENTENCES: Record<Exclude<EntryOutcome, { ok: true }>["code"], string> = {
  encrypted:
    "This file is password-protected inside the zip, so Foldwright cannot open it. Unpack it with its password, zip the folder again without one and import that, or upload the file at Intake.",
  too_large: "",
  zip_bomb:
    "This file unpacks to far more than the zip declares, so Foldwright did not store it: the archive may be damaged or made to cause harm. Check the file in the original folder and upload it at Intake if it is sound.",
  damaged:
    "This file could not be unpacked: the zip is damaged at this file. Zip the folder again and import it, or upload the file from the original folder at Intake.",
};

export function entrySentence(code: keyof typeof ENTRY_SENTENCES, size: number): string {
  if (code === "too_large") return checkFileSize(Math.max(size, env.uploadMaxBytes + 1), env.uploadMaxBytes)!.message;
  return ENTRY_SENTENCES[code];
}

/** Where a zip waits on this machine while its import runs (the bucket holds the lasting copy). */
export function localZipPath(importId: number): string {
  return path.join(os.tmpdir(), "foldwright-imports", `import-${importId}.zip`);
}

async function ensureLocalZip(importId: number, storageKey: string, size: number): Promise<string> {
  const file = localZipPath(importId);
  const have = await fs.promises.stat(file).catch(() => null);
  if (have?.size === size) return file;
  await fs.promises.mkdir(path.dirname(file), { recursive: true });
  await pipeline(await getObjectStream(storageKey), fs.createWriteStream(file)); // streamed, never whole in memory
  return file;
}

interface WaitingFile {
  id: number;
  position: number;
  path: string;
  size_bytes: number;
  staging_key: string | null;
}

async function settleFile(id: number, fields: Record<string, unknown>): Promise<void> {
  await getDb()("import_files").where({ id }).update({ ...fields, updated_at: getDb().fn.now(3) });
}

/** Stores one file; storage or database away is thrown, so the job is tried again later. */
async function bringIn(user: CurrentUser, file: WaitingFile, bytes: Uint8Array): Promise<void> {
  const result: UploadResult = await storeUpload(user, path.posix.basename(file.path), bytes, {
    withRow: async (trx, documentId) => {
      await trx("import_files").where({ id: file.id }).update({ state: "reading", document_id: documentId, updated_at: trx.fn.now(3) });
    },
  });
  if (result.status === "reading") return;
  if (result.status === "duplicate") {
    await settleFile(file.id, { state: "duplicate", code: "duplicate", document_id: result.duplicateOf.id, message: result.duplicateOf.message.slice(0, 800) });
    return;
  }
  if (result.httpStatus >= 500) throw new Error(`storing ${file.path}: ${result.error.message}`);
  await settleFile(file.id, { state: "rejected", code: result.error.code, message: result.error.message.slice(0, 800) });
}

async function takeOutcome(user: CurrentUser, file: WaitingFile, outcome: EntryOutcome): Promise<void> {
  if (outcome.ok) return bringIn(user, file, outcome.bytes);
  await settleFile(file.id, { state: "rejected", code: outcome.code, message: entrySentence(outcome.code, Number(file.size_bytes)) });
}

/** Runs the job; returns the import's id once the storing part is done and the job completed. */
export async function runImport(jobId: number, workerId: string, importId: number): Promise<boolean> {
  const db = getDb();
  const imp = await db("imports").where({ id: importId }).first("id", "state", "source_kind", "storage_key", "size_bytes", "confirmed_by");
  if (!imp || imp.state !== "importing") {
    await db.transaction((trx) => completeJob(trx, jobId, workerId));
    return false;
  }
  const userRow = await db("users").where({ id: imp.confirmed_by }).first("id", "email", "name", "role");
  const user: CurrentUser = { id: userRow.id, email: userRow.email, name: userRow.name, role: userRow.role };
  const waiting: WaitingFile[] = await db("import_files").where({ import_id: importId, state: "waiting" }).orderBy("position").select("id", "position", "path", "size_bytes", "staging_key");
  const byPosition = new Map(waiting.map((f) => [f.position, f]));

  if (imp.source_kind === "zip" && waiting.length > 0) {
    const zip = await ensureLocalZip(importId, imp.storage_key, Number(imp.size_bytes));
    try {
      await eachZipEntry(zip, (p) => byPosition.has(p), env.uploadMaxBytes, async (p, outcome) => {
        await takeOutcome(user, byPosition.get(p)!, outcome);
        byPosition.delete(p);
      });
    } catch (e) {
      // The archive itself broke off (a damaged directory, a cut-off file): what was not reached is reported.
      console.error(`import ${importId}: the zip could not be read to the end:`, e);
      for (const file of byPosition.values()) {
        await settleFile(file.id, { state: "rejected", code: "damaged", message: ENTRY_SENTENCES.damaged });
      }
    }
  } else {
    for (const file of waiting) {
      if (!file.staging_key) continue;
      const bytes = await getObjectBytes(file.staging_key);
      await bringIn(user, file, bytes);
      await deleteObject(file.staging_key).catch(() => undefined);
    }
  }

  const done = await db.transaction(async (trx) => {
    if (!(await completeJob(trx, jobId, workerId))) return false;
    await trx("imports").where({ id: importId, state: "importing" }).update({ state: "reading" });
    return true;
  });
  if (done && imp.storage_key) {
    await fs.promises.rm(localZipPath(importId), { force: true });
    await deleteObject(imp.storage_key).catch((e) => console.error(`import ${importId}: could not remove the uploaded zip:`, e));
  }
  return done;
}
