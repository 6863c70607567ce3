// Reads an archive from a file on disk with yauzl: the central directory first (names and sizes,
// nothing unpacked), then one entry at a time, each capped, so memory holds at most one file
// (itself under UPLOAD_MAX_BYTES) however large the archive is. Never rejects for one bad entry:
// the entry's problem is its own outcome.
import yauzl, { type Entry, type ZipFile } from "yauzl";

export interface ZipListing {
  position: number; // the entry's place in the central directory
  path: string;
  size: number; // as declared
  compressedSize: number;
  encrypted: boolean;
  directory: boolean;
}

export type EntryOutcome =
  | { ok: true; bytes: Buffer }
  | { ok: false; code: "encrypted" | "too_large" | "zip_bomb" | "damaged"; detail: string };

// A declared ratio this high is what a zip bomb looks like; an office's PDFs, Word files and scans
// compress far less (common practice for zip-bomb screens, e.g. 100:1; we allow 1000:1).
export const MAX_RATIO = 1000;
const RATIO_FLOOR = 1024 * 1024; // small entries can be as compressible as they like

function openZip(path: string): Promise<ZipFile> {
  return new Promise((resolve, reject) =>
    yauzl.open(path, { lazyEntries: true, autoClose: false, strictFileNames: false, validateEntrySizes: true, decodeStrings: true }, (err, zip) =>
      err ? reject(err) : resolve(zip),
    ),
  );
}

/** Walks the directory; `visit` may await (the next entry is read after it settles). */
async function walk(path: string, visit: (zip: ZipFile, entry: Entry, position: number) => Promise<void>): Promise<void> {
  const zip = await openZip(path);
  try {
    await new Promise<void>((resolve, reject) => {
      let position = 0;
      zip.on("entry", (entry: Entry) => {
        visit(zip, entry, position++).then(() => zip.readEntry(), reject);
      });
      zip.on("end", () => resolve());
      zip.on("error", reject);
      zip.readEntry();
    });
  } finally {
    zip.close();
  }
}

export async function listZip(path: string): Promise<ZipListing[]> {
  const out: ZipListing[] = [];
  await walk(path, async (_zip, entry, position) => {
    out.push({
      position,
      path: entry.fileName,
      size: entry.uncompressedSize,
      compressedSize: entry.compressedSize,
      encrypted: entry.isEncrypted(),
      directory: entry.fileName.endsWith("/"),
    });
  });
  return out;
}

function readEntry(zip: ZipFile, entry: Entry, maxBytes: number): Promise<EntryOutcome> {
  if (entry.isEncrypted()) return Promise.resolve({ ok: false, code: "encrypted", detail: "encrypted entry" });
  if (entry.uncompressedSize > maxBytes) return Promise.resolve({ ok: false, code: "too_large", detail: `${entry.uncompressedSize} bytes declared` });
  if (entry.uncompressedSize > RATIO_FLOOR && entry.uncompressedSize > MAX_RATIO * Math.max(1, entry.compressedSize)) {
    return Promise.resolve({ ok: false, code: "zip_bomb", detail: `declares ${entry.uncompressedSize} bytes from ${entry.compressedSize}` });
  }
  return new Promise((resolve) => {
    zip.openReadStream(entry, (err, stream) => {
      if (err) return resolve({ ok: false, code: "damaged", detail: err.message });
      const chunks: Buffer[] = [];
      let total = 0;
      let settled = false;
      const finish = (o: EntryOutcome) => {
        if (settled) return;
        settled = true;
        resolve(o);
      };
      stream.on("data", (chunk: Buffer) => {
        total += chunk.length;
        // yauzl already refuses more bytes than declared; this is the cap if a declaration lies high.
        if (total > maxBytes) {
          stream.destroy();
          finish({ ok: false, code: "zip_bomb", detail: `unpacks past ${maxBytes} bytes` });
        } else chunks.push(chunk);
      });
      stream.on("error", (e: Error) =>
        finish({ ok: false, code: /too many bytes|expected \d+ bytes/i.test(e.message) ? "zip_bomb" : "damaged", detail: e.message }),
      );
      stream.on("end", () => finish({ ok: true, bytes: Buffer.concat(chunks, total) }));
    });
  });
}

/**
 * Reads the entries whose positions `want` says, in archive order, handing each to `take` before
 * the next is unpacked.
 */
export async function eachZipEntry(
  path: string,
  want: (position: number) => boolean,
  maxBytes: number,
  take: (position: number, outcome: EntryOutcome) => Promise<void>,
): Promise<void> {
  await walk(path, async (zip, entry, position) => {
    if (!want(position)) return;
    await take(position, await readEntry(zip, entry, maxBytes));
  });
}
