// Hostile and broken inputs for the intake tests, built in memory.
import JSZip from "jszip";
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { crc32, createDeflateRaw, deflateRawSync } from "node:zlib";

export const QPDF = "/usr/bin/qpdf";

interface ZipPart {
  name: string;
  crc: number;
  compressed: Uint8Array;
  /** What the central directory will claim; honest unless a test says otherwise. */
  declaredSize: number;
  /** Marks the entry encrypted (general purpose bit 0, APPNOTE 4.4.4) without encrypting it. */
  encrypted?: boolean;
}

/** An honest deflated part holding `data`. */
export function makePart(name: string, data: Uint8Array): ZipPart {
  return { name, crc: crc32(data), compressed: deflateRawSync(data), declaredSize: data.length };
}

/** A zip of the given parts, in order (an archive to import, say). */
export function makeZip(parts: ZipPart[]): Uint8Array {
  return writeZip(parts);
}

/** Re-packs a real .docx and adds `extra` parts after its own, as a zip with deflated entries. */
export async function repackDocx(docx: Uint8Array, extra: ZipPart[]): Promise<Uint8Array> {
  const zip = await JSZip.loadAsync(docx);
  const parts: ZipPart[] = [];
  for (const file of Object.values(zip.files).filter((f) => !f.dir)) {
    const data = await file.async("uint8array");
    parts.push({ name: file.name, crc: crc32(data), compressed: deflateRawSync(data), declaredSize: data.length });
  }
  return writeZip([...parts, ...extra]);
}

/**
 * A part of `megabytes` MB of zeros, deflated 1 MB at a time so the test never holds the
 * unpacked data: 300 MB of zeros deflate to about 300 KB.
 */
export async function makeZeroPart(name: string, megabytes: number): Promise<ZipPart> {
  const chunk = new Uint8Array(1024 * 1024);
  const deflater = createDeflateRaw({ level: 9 });
  const output: Buffer[] = [];
  deflater.on("data", (data: Buffer) => output.push(data));
  const finished = new Promise((resolve, reject) => deflater.on("end", resolve).on("error", reject));
  let crc = 0;
  for (let i = 0; i < megabytes; i += 1) {
    crc = crc32(chunk, crc);
    if (!deflater.write(chunk)) await new Promise((resolve) => deflater.once("drain", resolve));
  }
  deflater.end();
  await finished;
  return { name, crc, compressed: Buffer.concat(output), declaredSize: megabytes * 1024 * 1024 };
}

/** A part whose header lies: it declares `declaredSize` bytes but inflates to `realSize`. */
export function makeLyingPart(name: string, realSize: number, declaredSize: number): ZipPart {
  const data = new Uint8Array(realSize);
  return { name, crc: crc32(data), compressed: deflateRawSync(data), declaredSize };
}

export function makeTinyPart(name: string): ZipPart {
  const data = new TextEncoder().encode("x");
  return { name, crc: crc32(data), compressed: deflateRawSync(data), declaredSize: 1 };
}

// Minimal zip writer (PKWARE APPNOTE 4.3.7 local header, 4.3.12 central header, 4.3.16 end record).
function writeZip(parts: ZipPart[]): Uint8Array {
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const part of parts) {
    const name = Buffer.from(part.name, "utf8");
    const local = Buffer.alloc(30);
    local.writeUInt32LE(0x04034b50, 0);
    local.writeUInt16LE(20, 4);
    const flags = 0x0800 | (part.encrypted ? 0x0001 : 0); // UTF-8 names; bit 0: encrypted
    local.writeUInt16LE(flags, 6);
    local.writeUInt16LE(8, 8); // deflate
    local.writeUInt32LE(part.crc, 14);
    local.writeUInt32LE(part.compressed.length, 18);
    local.writeUInt32LE(part.declaredSize, 22);
    local.writeUInt16LE(name.length, 26);
    const central = Buffer.alloc(46);
    central.writeUInt32LE(0x02014b50, 0);
    central.writeUInt16LE(20, 4);
    central.writeUInt16LE(20, 6);
    central.writeUInt16LE(flags, 8);
    central.writeUInt16LE(8, 10);
    central.writeUInt32LE(part.crc, 16);
    central.writeUInt32LE(part.compressed.length, 20);
    central.writeUInt32LE(part.declaredSize, 24);
    central.writeUInt16LE(name.length, 28);
    central.writeUInt32LE(offset, 42);
    locals.push(local, name, Buffer.from(part.compressed));
    centrals.push(central, name);
    offset += local.length + name.length + part.compressed.length;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return new Uint8Array(Buffer.concat([...locals, directory, end]));
}

/** The smallest ELF header file-type recognises: a Linux program's first bytes. */
export function makeElfBytes(): Uint8Array {
  const bytes = new Uint8Array(64);
  bytes.set([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1]); // \x7fELF, 64-bit, little-endian, version 1
  return bytes;
}

/** A DOS/Windows program header: "MZ" then padding, as every .exe starts. */
export function makeExeBytes(): Uint8Array {
  const bytes = new Uint8Array(128);
  bytes.set([0x4d, 0x5a, 0x90, 0x00]);
  return bytes;
}

/** Repeatable noise (a linear congruential generator), so a failure can be replayed. */
export function makeNoiseBytes(length: number, seed = 20261201): Uint8Array {
  const bytes = new Uint8Array(length);
  let state = seed;
  for (let i = 0; i < length; i += 1) {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    bytes[i] = state >>> 24;
  }
  return bytes;
}

/** Encrypts with Debian's qpdf (AES-256, user password "user"), the way offices lock PDFs. */
export function encryptWithQpdf(pdf: Uint8Array): Uint8Array {
  if (!existsSync(QPDF)) {
    throw new Error(`${QPDF} is missing: install Debian's qpdf package (the project's test command does).`);
  }
  const dir = mkdtempSync(path.join(tmpdir(), "foldwright-qpdf-"));
  try {
    writeFileSync(path.join(dir, "in.pdf"), pdf);
    const run = spawnSync(QPDF, ["--encrypt", "user", "owner", "256", "--", "in.pdf", "out.pdf"], { cwd: dir });
    if (run.status !== 0) throw new Error(`qpdf failed: ${run.stderr.toString()}`);
    return new Uint8Array(readFileSync(path.join(dir, "out.pdf")));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
