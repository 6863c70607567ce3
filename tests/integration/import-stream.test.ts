import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import yazl from "yazl";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { claimJobs } from "@/lib/data/jobs";
import { confirmImport, getImport } from "@/lib/data/imports";
import { receiveImport } from "@/lib/data/import-receive";
import { runImport } from "@/lib/data/import-run";
import type { CurrentUser } from "@/lib/data/users";
import { IMPORT_JOB } from "@/lib/jobs/kinds";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";

// A large import streams: 120 files of 2 MB (a 240 MB zip of incompressible bytes) go from a
// streamed multipart request through the temp file, the bucket and the job's one-file-at-a-time
// reading into storage, and this process's memory (where route and job run) grows by far less
// than the archive. If either step held the archive whole, the peak would exceed 240 MB.
const FILES = 120;
const FILE_BYTES = 2 * 1024 * 1024;
const owner = ownerDb();
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "import-stream-"));
const zipPath = path.join(dir, "big.zip");
let admin: CurrentUser;

/** A PDF-looking file of random bytes, made as it is read, so the test itself holds none of them. */
function lazyPdf(index: number): Readable {
  let sent = 0;
  return new Readable({
    read() {
      if (sent >= FILE_BYTES) return void this.push(null);
      const head = sent === 0 ? Buffer.from(`%PDF-1.4\n% stream test ${index} ${crypto.randomUUID()}\n`) : Buffer.alloc(0);
      const chunk = Buffer.concat([head, crypto.randomBytes(Math.min(256 * 1024, FILE_BYTES - sent) - head.length)]);
      sent += chunk.length;
      this.push(chunk);
    },
  });
}

async function writeArchive(): Promise<number> {
  const zip = new yazl.ZipFile();
  for (let i = 0; i < FILES; i += 1) zip.addReadStream(lazyPdf(i), `Archive/Invoices/invoice-${i}.pdf`, { compress: false, size: FILE_BYTES });
  zip.end();
  await new Promise<void>((resolve, reject) => zip.outputStream.pipe(fs.createWriteStream(zipPath)).on("close", resolve).on("error", reject));
  return fs.statSync(zipPath).size;
}

/** A multipart request whose body is read from disk as the route consumes it. */
function streamedRequest(): Request {
  const boundary = `----import${crypto.randomUUID()}`;
  const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.zip"\r\nContent-Type: application/zip\r\n\r\n`);
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  async function* body() {
    yield head;
    for await (const chunk of fs.createReadStream(zipPath, { highWaterMark: 256 * 1024 })) yield chunk as Buffer;
    yield tail;
  }
  const stream = Readable.toWeb(Readable.from(body())) as unknown as ReadableStream;
  return new Request("http://127.0.0.1/api/imports", { method: "POST", body: stream, headers: { "content-type": `multipart/form-data; boundary=${boundary}` }, duplex: "half" } as RequestInit);
}

function sampleMemory() {
  let peak = process.memoryUsage().rss;
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  return { stop: () => (clearInterval(timer), peak) };
}

beforeAll(async () => {
  admin = await demoUser("admin@example.com");
});
afterAll(async () => {
  fs.rmSync(dir, { recursive: true, force: true });
  await owner.destroy();
  await closeDb();
});

describe("a large import", () => {
  it("streams to storage with memory far below the archive's size", async () => {
    const size = await writeArchive();
    expect(size).toBeGreaterThan(FILES * FILE_BYTES);
    global.gc?.();
    const before = process.memoryUsage().rss;
    const memory = sampleMemory();
    const id = await receiveImport(admin, streamedRequest());
    const proposed = await getImport(admin, id);
    expect(proposed.folders).toMatchObject([{ name: "Invoices", files: FILES, bytes: FILES * FILE_BYTES }]);
    const invoices = await owner("cabinet_types").where({ name: "Invoices & receipts" }).first("id");
    const matter = await owner("matters").orderBy("id").first("id");
    await confirmImport(admin, id, { folders: [{ name: "Invoices", action: "existing", cabinetTypeId: invoices.id }], matters: [], defaultMatterId: matter.id });
    const [job] = await claimJobs("stream-test", [IMPORT_JOB], 1, 300);
    expect(job).toBeTruthy();
    expect(await runImport(job.id, "stream-test", id)).toBe(true);
    const peak = memory.stop();

    const after = await getImport(admin, id);
    expect(after.counts).toMatchObject({ total: FILES, reading: FILES }); // all stored, waiting for the read workers
    const grew = (peak - before) / 1024 / 1024;
    console.log(`import of ${(size / 1048576).toFixed(0)} MB: memory grew ${grew.toFixed(0)} MB at the peak`);
    expect(grew).toBeLessThan((FILES * FILE_BYTES) / 1024 / 1024 / 2);
    // The last original is whole (its size as made), not cut off.
    const last = await owner("documents").where({ id: after.files[FILES - 1].documentId }).first("size_bytes");
    expect(Number(last.size_bytes)).toBe(FILE_BYTES);
  });
});
