// Reads a multipart upload as it arrives (busboy), writing each file to a temporary file on disk
// while hashing and counting it, so memory stays flat whatever the file's size. UPLOAD_MAX_BYTES
// holds per file and for all files of one request together: the moment a file (or the request)
// passes it, reading stops and the answer is 413 — the rest of the body is never read.
import busboy from "busboy";
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import type { ReadableStream as NodeWebStream } from "node:stream/web";
import { AppError } from "@/lib/errors";
import { formatSize } from "./format-size";

export interface SpooledFile {
  name: string;
  /** The temporary file holding the bytes; removed by `discard`. */
  path: string;
  size: number;
  sha256: string;
  /** The first 4 KB, for sniffing the kind. */
  head: Buffer;
}

export interface SpoolOptions {
  maxBytes: number;
  maxFiles: number;
}

const HEAD_BYTES = 4096;

function tooLarge(maxBytes: number, what: "file" | "request"): AppError {
  return new AppError(
    413,
    "too_large",
    what === "file"
      ? `A file in this upload is larger than the ${formatSize(maxBytes)} Foldwright takes in one file, so nothing was kept. Split it into smaller files, or scan at a lower resolution, and upload those.`
      : `This upload is larger than the ${formatSize(maxBytes)} Foldwright takes at once, so nothing was kept. Upload the files in smaller groups.`,
  );
}

/**
 * Spools the `file` fields of a multipart request to disk. Throws AppError 413 as soon as a limit
 * is passed (having stopped reading), 413 for too many files, 400 for a body that is not multipart.
 */
export async function spoolUpload(request: Request, options: SpoolOptions): Promise<{ files: SpooledFile[]; dispose: () => Promise<void> }> {
  if (!request.body) throw new AppError(422, "no_files", 'No files came with this upload. Add one or more fields named "file".');
  const dir = await fs.promises.mkdtemp(path.join(os.tmpdir(), "foldwright-upload-"));
  const files: SpooledFile[] = [];
  const source = Readable.fromWeb(request.body as unknown as NodeWebStream<Uint8Array>);
  let parser: busboy.Busboy;
  try {
    parser = busboy({
      headers: { "content-type": request.headers.get("content-type") ?? "" },
      limits: { fileSize: options.maxBytes + 1, files: options.maxFiles, fields: 20, fieldSize: 64 * 1024 },
    });
  } catch {
    await fs.promises.rm(dir, { recursive: true, force: true });
    throw new AppError(415, "bad_form", 'The upload could not be read. Send the files again as multipart/form-data fields named "file".');
  }

  let total = 0;
  const writes: Promise<void>[] = [];
  const outs: fs.WriteStream[] = [];
  const dispose = () => fs.promises.rm(dir, { recursive: true, force: true }).catch(() => {});
  try {
    await new Promise<void>((resolve, reject) => {
      let failed = false;
      const fail = (e: unknown) => {
        if (failed) return;
        failed = true;
        source.unpipe(parser);
        for (const out of outs) out.destroy();
        // The refusal is answered at once; what the client is still sending is read and dropped
        // (never kept) so that a browser sees the answer rather than a reset connection, up to
        // as much again as the limit — beyond that the connection is cut.
        let dropped = 0;
        source.on("data", (c: Buffer) => {
          dropped += c.length;
          if (dropped > options.maxBytes) source.destroy();
        });
        source.on("error", () => {});
        source.resume();
        reject(e);
      };
      parser.on("file", (field, stream, info) => {
        if (field !== "file") {
          stream.resume();
          return;
        }
        const file: SpooledFile = { name: info.filename ?? "", path: path.join(dir, String(files.length)), size: 0, sha256: "", head: Buffer.alloc(0) };
        files.push(file);
        const hash = crypto.createHash("sha256");
        const heads: Buffer[] = [];
        let headLength = 0;
        const out = fs.createWriteStream(file.path);
        outs.push(out);
        stream.on("data", (chunk: Buffer) => {
          file.size += chunk.length;
          total += chunk.length;
          if (file.size > options.maxBytes) fail(tooLarge(options.maxBytes, "file"));
          else if (total > options.maxBytes) fail(tooLarge(options.maxBytes, "request"));
          hash.update(chunk);
          if (headLength < HEAD_BYTES) {
            heads.push(chunk);
            headLength += chunk.length;
          }
        });
        stream.on("limit", () => fail(tooLarge(options.maxBytes, "file")));
        stream.pipe(out);
        writes.push(
          new Promise<void>((done, broken) => {
            out.on("finish", () => {
              file.sha256 = hash.digest("hex");
              file.head = Buffer.concat(heads).subarray(0, HEAD_BYTES);
              done();
            });
            out.on("error", broken);
            out.on("close", () => done()); // destroyed after a refusal: nothing more to wait for
          }),
        );
      });
      parser.on("filesLimit", () =>
        fail(new AppError(413, "too_many_files", `At most ${options.maxFiles} files go in one upload. Split the rest into another upload.`)),
      );
      // busboy refuses a part header with a control character (RFC 7230 §3.2 field values), which
      // is where a file's name travels.
      parser.on("error", () =>
        fail(new AppError(400, "bad_form", 'The upload could not be read: its form is damaged, or a file\'s name holds control characters. Rename the file with letters, digits and punctuation only, and send it again as a multipart/form-data field named "file".')),
      );
      parser.on("close", () => {
        if (!failed) resolve();
      });
      source.on("error", () => fail(new AppError(400, "upload_cut", "The upload stopped before it was complete, so nothing was kept. Upload the files again.")));
      source.pipe(parser);
    });
    await Promise.all(writes);
    return { files, dispose };
  } catch (e) {
    await Promise.allSettled(writes);
    await dispose();
    throw e;
  }
}
