// Reads a zip's central directory without unpacking anything, so the sizes an archive declares can
// be checked before mammoth (through jszip) inflates it. Layout from PKWARE's APPNOTE.TXT
// (sections 4.3.12 central directory header, 4.3.14-4.3.16 end records, 4.5.3 Zip64 extra field).

export interface ZipEntry {
  name: string;
  method: number;
  compressedSize: number;
  uncompressedSize: number;
  localHeaderOffset: number;
}

const EOCD = 0x06054b50;
const ZIP64_LOCATOR = 0x07064b50;
const ZIP64_EOCD = 0x06064b50;
const CENTRAL_HEADER = 0x02014b50;
const MAX_COMMENT = 0xffff;
const SATURATED32 = 0xffffffff;

/** Lists the entries of a zip from its central directory; throws when the directory is unreadable. */
export function listZipEntries(bytes: Uint8Array): ZipEntry[] {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const eocd = findEndRecord(view);
  let count = view.getUint16(eocd + 10, true);
  let offset = view.getUint32(eocd + 16, true);
  if (count === 0xffff || offset === SATURATED32) ({ count, offset } = readZip64End(view, eocd));

  const entries: ZipEntry[] = [];
  for (let i = 0; i < count; i += 1) {
    if (offset + 46 > view.byteLength || view.getUint32(offset, true) !== CENTRAL_HEADER) {
      throw new Error(`Zip central directory entry ${i + 1} of ${count} is missing.`);
    }
    const nameLength = view.getUint16(offset + 28, true);
    const extraLength = view.getUint16(offset + 30, true);
    const commentLength = view.getUint16(offset + 32, true);
    const entry: ZipEntry = {
      name: new TextDecoder().decode(bytes.subarray(offset + 46, offset + 46 + nameLength)),
      method: view.getUint16(offset + 10, true),
      compressedSize: view.getUint32(offset + 20, true),
      uncompressedSize: view.getUint32(offset + 24, true),
      localHeaderOffset: view.getUint32(offset + 42, true),
    };
    applyZip64Extra(view, offset + 46 + nameLength, extraLength, entry);
    entries.push(entry);
    offset += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

function findEndRecord(view: DataView): number {
  const lowest = Math.max(0, view.byteLength - 22 - MAX_COMMENT);
  for (let at = view.byteLength - 22; at >= lowest; at -= 1) {
    if (view.getUint32(at, true) === EOCD) return at;
  }
  throw new Error("No zip end-of-central-directory record was found.");
}

function readZip64End(view: DataView, eocd: number): { count: number; offset: number } {
  const locator = eocd - 20;
  if (locator < 0 || view.getUint32(locator, true) !== ZIP64_LOCATOR) {
    throw new Error("The zip claims Zip64 sizes but has no Zip64 locator.");
  }
  const record = readUint64(view, locator + 8);
  if (record + 56 > view.byteLength || view.getUint32(record, true) !== ZIP64_EOCD) {
    throw new Error("The Zip64 end record is missing.");
  }
  return { count: readUint64(view, record + 32), offset: readUint64(view, record + 48) };
}

// The Zip64 extra field holds, in this order, only the sizes saturated in the fixed header.
function applyZip64Extra(view: DataView, start: number, length: number, entry: ZipEntry): void {
  for (let at = start; at + 4 <= start + length; ) {
    const id = view.getUint16(at, true);
    const size = view.getUint16(at + 2, true);
    if (id === 0x0001) {
      let field = at + 4;
      if (entry.uncompressedSize === SATURATED32) {
        entry.uncompressedSize = readUint64(view, field);
        field += 8;
      }
      if (entry.compressedSize === SATURATED32) {
        entry.compressedSize = readUint64(view, field);
        field += 8;
      }
      if (entry.localHeaderOffset === SATURATED32) entry.localHeaderOffset = readUint64(view, field);
      return;
    }
    at += 4 + size;
  }
}

// Past 2^53 a number loses precision, but any such size is already far over every limit.
function readUint64(view: DataView, at: number): number {
  if (at + 8 > view.byteLength) throw new Error("A Zip64 field runs past the end of the file.");
  return Number(view.getBigUint64(at, true));
}
