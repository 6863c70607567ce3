import "server-only";
// Receives an archive for import as it streams in, never whole in memory: a zip goes to a temp
// file (yauzl reads its directory there), then to the bucket so any worker can run the import;
// a dropped folder's files go one by one to staging objects in the bucket. Then the import is
// recorded with what was found and the proposal (lib/data/imports.ts).
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import type { ReadableStream as WebReadableStream } from "node:stream/web";
import busboy from "busboy";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { formatSize } from "@/lib/intake/format-size";
import { isDatabaseUnavailable } from "@/db/errors";
import { createImport, type SourceFile } from "@/lib/data/imports";
import { localZipPath } from "@/lib/data/import-run";
import type { CurrentUser } from "@/lib/data/users";
import { listZip } from "@/lib/imports/read-zip";
import { normalisePath } from "@/lib/imports/archive-folders";
import { deleteObject, getS3, isStorageUnavailable } from "@/storage/s3";
import { PutObjectCommand } from "@aws-sdk/client-s3";
import { DATABASE_DOWN, STORAGE_DOWN } from "@/lib/data/intake";

const NOT_A_ZIP =
  "This file is not a zip archive Foldwright can read (it may be damaged, or another kind of file). Zip the folder that holds your cabinet-type folders again and upload that, or drop the folder itself.";

async function putFile(key: string, file: string, size: number, contentType: string): Promise<void> {
  await getS3().send(new PutObjectCommand({ Bucket: env.s3.bucket, Key: key, Body: fs.createReadStream(file), ContentLength: size, ContentType: contentType }));
}

async function putBytes(key: string, bytes: Buffer): Promise<void> {
  await getS3().send(new PutObjectCommand({ Bucket: env.s3.bucket, Key: key, Body: bytes, ContentLength: bytes.length, ContentType: "application/octet-stream" }));
}

function tooLarge(): AppError {
  return new AppError(413, "too_large", `This archive is larger than the ${formatSize(env.imports.maxBytes)} Foldwright takes in one import. Import its folders in several parts.`);
}

interface Received {
  zip: { file: string; name: string; size: number } | null;
  folder: { name: string; files: SourceFile[] };
  staged: string[];
}

function parse(request: Request, tempDir: string): Promise<Received> {
  const received: Received = { zip: null, folder: { name: "", files: [] }, staged: [] };
  return new Promise((resolve, reject) => {
    const bb = busboy({
      headers: { "content-type": request.headers.get("content-type") ?? "" },
      preservePath: true,
      limits: { files: env.imports.maxFiles + 1, fileSize: env.imports.maxBytes, fields: env.imports.maxFiles * 2 + 10 },
    });
    let chain: Promise<void> = Promise.resolve();
    let nextPath: string | null = null;
    let position = 0;
    let total = 0;
    const fail = (e: unknown) => {
      reject(e);
      bb.removeAllListeners("file");
    };
    bb.on("field", (name, value) => {
      if (name === "path") nextPath = value;
      if (name === "source") received.folder.name = value.slice(0, 255);
    });
    bb.on("file", (field, stream, info) => {
      const relPath = normalisePath(nextPath ?? info.filename ?? "");
      nextPath = null;
      chain = chain.then(async () => {
        if (field === "file") {
          if (received.zip) throw new AppError(422, "one_zip", "Send one zip per import (the field \"file\"), or the files of one folder (fields \"folderFile\").");
          const file = path.join(tempDir, `upload-${crypto.randomUUID()}.zip`);
          received.zip = { file, name: path.posix.basename(relPath) || "archive.zip", size: 0 };
          let truncated = false;
          stream.on("limit", () => (truncated = true));
          await pipeline(stream, fs.createWriteStream(file));
          if (truncated) throw tooLarge();
          received.zip.size = (await fs.promises.stat(file)).size;
          return;
        }
        if (field !== "folderFile") {
          stream.resume();
          return;
        }
        // One file of a dropped folder: at most UPLOAD_MAX_BYTES is held, then it goes to staging.
        const chunks: Buffer[] = [];
        let size = 0;
        let over = false;
        for await (const chunk of stream as AsyncIterable<Buffer>) {
          size += chunk.length;
          total += chunk.length;
          if (total > env.imports.maxBytes) throw tooLarge();
          if (size > env.uploadMaxBytes) over = true;
          else chunks.push(chunk);
        }
        const entry: SourceFile = { path: relPath || `file-${position + 1}`, size, position: position++ };
        if (over) entry.problem = { code: "too_large", message: `This file is ${formatSize(size)}, more than the ${formatSize(env.uploadMaxBytes)} Foldwright takes in one file. Split it, or scan at a lower resolution, and upload it at Intake.` };
        else {
          const key = `imports/staging/${crypto.randomUUID()}`;
          await putBytes(key, Buffer.concat(chunks, size));
          received.staged.push(key);
          entry.stagingKey = key;
        }
        received.folder.files.push(entry);
      });
      chain.catch(fail);
    });
    bb.on("filesLimit", () => fail(new AppError(413, "too_many_files", `At most ${env.imports.maxFiles.toLocaleString("en-US")} files go in one import. Import the folders in several parts.`)));
    bb.on("error", (e) => fail(new AppError(400, "bad_form", `The upload could not be read (${e instanceof Error ? e.message : e}). Send it again as multipart/form-data.`)));
    bb.on("close", () => chain.then(() => resolve(received), reject));
    const body = request.body ? Readable.fromWeb(request.body as unknown as WebReadableStream) : Readable.from([]);
    body.on("error", fail);
    body.pipe(bb);
  });
}

async function cleanUp(received: Received | null): Promise<void> {
  if (!received) return;
  if (received.zip) await fs.promises.rm(received.zip.file, { force: true });
  for (const key of received.staged) await deleteObject(key).catch(() => undefined);
}

export async function receiveImport(user: CurrentUser, request: Request): Promise<number> {
  const tempDir = path.join(os.tmpdir(), "foldwright-imports");
  await fs.promises.mkdir(tempDir, { recursive: true });
  let received: Received | null = null;
  let zipKey: string | null = null;
  try {
    received = await parse(request, tempDir);
    if (received.zip) {
      const listing = await listZip(received.zip.file).catch(() => {
        throw new AppError(422, "not_a_zip", NOT_A_ZIP);
      });
      zipKey = `imports/${crypto.randomUUID()}.zip`;
      await putFile(zipKey, received.zip.file, received.zip.size, "application/zip");
      const files: SourceFile[] = listing.filter((e) => !e.directory).map((e) => ({ path: e.path, size: e.size, position: e.position }));
      const id = await createImport(user, { kind: "zip", name: received.zip.name, sizeBytes: received.zip.size, storageKey: zipKey, files });
      // The import job on this machine reads the zip from here rather than from the bucket.
      await fs.promises.rename(received.zip.file, localZipPath(id)).catch(() => undefined);
      return id;
    }
    if (received.folder.files.length === 0) {
      throw new AppError(422, "no_files", "No archive came with this upload. Send the zip as the field \"file\", or a folder's files as fields \"folderFile\", each after a \"path\" field.");
    }
    const name = received.folder.name || received.folder.files[0].path.split("/")[0] || "folder";
    const size = received.folder.files.reduce((s, f) => s + f.size, 0);
    return await createImport(user, { kind: "folder", name, sizeBytes: size, storageKey: null, files: received.folder.files });
  } catch (e) {
    await cleanUp(received);
    if (zipKey) await deleteObject(zipKey).catch(() => undefined);
    if (e instanceof AppError) throw e;
    if (isDatabaseUnavailable(e)) throw new AppError(503, "database_unavailable", DATABASE_DOWN.replace("this file was", "this archive was"));
    const fromStore = typeof e === "object" && e !== null && ("$metadata" in e || (e as { code?: string }).code === "ECONNREFUSED");
    if (fromStore && isStorageUnavailable(e)) throw new AppError(503, "storage_unavailable", STORAGE_DOWN.replace("this file was", "this archive was"));
    throw e;
  }
}
