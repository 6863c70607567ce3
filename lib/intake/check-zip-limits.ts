import { inflateRawSync } from "node:zlib";
import { formatSize } from "./format-size";
import type { ReadOptions } from "./types";
import { describeDamagedDocx, describeZipBomb, UnreadableError } from "./unreadable";
import { listZipEntries, type ZipEntry } from "./zip-directory";

const STORED = 0;
const DEFLATED = 8;
const LOCAL_HEADER = 0x04034b50;

type ZipLimits = Pick<ReadOptions, "maxUnzippedBytes" | "maxZipEntries">;

/**
 * Refuses a zip bomb before mammoth sees it: first from the sizes the central directory declares,
 * then by inflating each entry with a cap at its declared size, because a hostile archive can
 * declare small sizes and still expand without end (jszip only compares sizes after inflating).
 * The cap keeps memory at most the largest declared entry, itself under `maxUnzippedBytes`.
 */
export function checkZipLimits(bytes: Uint8Array, limits: ZipLimits): void {
  const entries = listEntriesOrFail(bytes);
  if (entries.length > limits.maxZipEntries) {
    throw bomb(`holds ${entries.length.toLocaleString("en-US")} parts (the limit is ${limits.maxZipEntries.toLocaleString("en-US")})`);
  }
  const declared = entries.reduce((sum, entry) => sum + entry.uncompressedSize, 0);
  if (declared > limits.maxUnzippedBytes) {
    throw bomb(`would unpack to ${formatSize(declared)} (the limit is ${formatSize(limits.maxUnzippedBytes)})`);
  }
  for (const entry of entries) verifyEntrySize(bytes, entry);
}

function listEntriesOrFail(bytes: Uint8Array): ZipEntry[] {
  try {
    return listZipEntries(bytes);
  } catch (error) {
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), String(error));
  }
}

function verifyEntrySize(bytes: Uint8Array, entry: ZipEntry): void {
  const data = locateEntryData(bytes, entry);
  if (entry.method === STORED) return; // stored data is as long as it is; nothing expands
  if (entry.method !== DEFLATED) {
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), `${entry.name}: zip method ${entry.method}`);
  }
  try {
    inflateRawSync(data, { maxOutputLength: Math.max(1, entry.uncompressedSize) });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ERR_BUFFER_TOO_LARGE") {
      throw bomb(`holds a part (${entry.name}) that unpacks to more than it declares`);
    }
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), `${entry.name}: ${String(error)}`);
  }
}

function locateEntryData(bytes: Uint8Array, entry: ZipEntry): Uint8Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = entry.localHeaderOffset;
  if (at + 30 > bytes.byteLength || view.getUint32(at, true) !== LOCAL_HEADER) {
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), `${entry.name}: local header missing`);
  }
  const start = at + 30 + view.getUint16(at + 26, true) + view.getUint16(at + 28, true);
  const end = start + entry.compressedSize;
  if (end > bytes.byteLength) {
    throw new UnreadableError("docx_damaged", describeDamagedDocx(), `${entry.name}: data cut off`);
  }
  return bytes.subarray(start, end);
}

function bomb(finding: string): UnreadableError {
  return new UnreadableError("zip_bomb", describeZipBomb(finding), finding);
}
