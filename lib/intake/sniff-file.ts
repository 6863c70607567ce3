import { fileTypeFromBuffer, fileTypeFromFile } from "file-type";
import { ACCEPTED_KINDS, ACCEPTED_SENTENCE } from "./file-kinds";
import { formatSize } from "./format-size";
import { describeRejectedKind } from "./rejected-kinds";
import type { FileKind, IntakeError, SniffResult } from "./types";

export const DEFAULT_MAX_UPLOAD_BYTES = 50 * 1024 * 1024;

// Names a clerk recognises for the kinds a file's name can pretend to be.
const NAMED_KINDS: Record<string, { kind: FileKind; label: string }> = {
  pdf: { kind: "pdf", label: "a PDF" },
  docx: { kind: "docx", label: "a Word file" },
  png: { kind: "png", label: "a PNG image" },
  jpg: { kind: "jpeg", label: "a JPEG image" },
  jpeg: { kind: "jpeg", label: "a JPEG image" },
  tif: { kind: "tiff", label: "a TIFF image" },
  tiff: { kind: "tiff", label: "a TIFF image" },
};

/**
 * Decides a file's kind from its bytes, never from its name, and refuses what Foldwright does not
 * keep with a status for the route (413, 415, 422) and a sentence the clerk can act on.
 */
export async function sniffFile(
  bytes: Uint8Array | { path: string; size: number; head: Uint8Array },
  originalName: string,
  options: { maxBytes?: number } = {},
): Promise<SniffResult> {
  // A file spooled to disk (a streamed upload) is sniffed from the disk, reading only what is needed.
  const onDisk = bytes instanceof Uint8Array ? null : bytes;
  const sizeError = checkFileSize(onDisk ? onDisk.size : (bytes as Uint8Array).byteLength, options.maxBytes ?? DEFAULT_MAX_UPLOAD_BYTES);
  if (sizeError) return { ok: false, error: sizeError };

  const claimed = NAMED_KINDS[readExtension(originalName)];
  const detected = onDisk
    ? ((await fileTypeFromFile(onDisk.path)) ?? detectLatePdfHeader(onDisk.head))
    : ((await fileTypeFromBuffer(bytes as Uint8Array)) ?? detectLatePdfHeader(bytes as Uint8Array));
  if (!detected) return { ok: false, error: describeUnknown(claimed?.label) };

  const kind = (Object.keys(ACCEPTED_KINDS) as FileKind[]).find(
    (candidate) => ACCEPTED_KINDS[candidate].mediaType === detected.mime,
  );
  if (!kind) return { ok: false, error: describeRefused(detected.ext, originalName, claimed !== undefined) };
  const { mediaType, extension } = ACCEPTED_KINDS[kind];
  return { ok: true, kind, mediaType, extension, nameMatches: claimed?.kind === kind };
}

/** Size check alone, so the route can refuse an upload while it is still streaming in. */
export function checkFileSize(byteLength: number, maxBytes: number): IntakeError | null {
  if (byteLength === 0) {
    return {
      status: 422,
      code: "empty",
      message: "This file is empty (0 bytes). Check that it finished saving or downloading, then upload it again.",
    };
  }
  if (byteLength > maxBytes) {
    return {
      status: 413,
      code: "too_large",
      message: `This file is ${formatSize(byteLength)}, more than the ${formatSize(maxBytes)} Foldwright takes in one file. Split it into smaller files, or scan at a lower resolution, and upload those.`,
    };
  }
  return null;
}

function describeUnknown(claimedLabel: string | undefined): IntakeError {
  const opening = claimedLabel
    ? `This file is named like ${claimedLabel}, but its contents are not: it may be damaged, or renamed from another kind of file.`
    : "Foldwright cannot tell what kind of file this is from its contents.";
  return {
    status: 415,
    code: "unknown_type",
    message: `${opening} ${ACCEPTED_SENTENCE} Open the original and save it as PDF, then upload that.`,
  };
}

function describeRefused(detectedExtension: string, originalName: string, nameClaimsAccepted: boolean): IntakeError {
  const { label, notDocument, advice } = describeRejectedKind(detectedExtension);
  const disguise = nameClaimsAccepted ? `, even though its name ends in .${readExtension(originalName)}` : "";
  const what = notDocument ? `${label}, not a document${disguise}` : `${label}${disguise}`;
  return {
    status: 415,
    code: "unsupported_type",
    message: `This file is ${what}. ${ACCEPTED_SENTENCE}${advice ? ` ${advice}` : ""}`,
  };
}

// Some scanners and mail gateways put a few bytes before "%PDF-". Acrobat and pdf.js accept the
// header anywhere in the first 1024 bytes; file-type looks only at offset 0.
function detectLatePdfHeader(bytes: Uint8Array): { ext: string; mime: string } | undefined {
  const head = Buffer.from(bytes.subarray(0, 1024)).toString("latin1");
  return head.indexOf("%PDF-") > 0 ? { ext: "pdf", mime: "application/pdf" } : undefined;
}

function readExtension(name: string): string {
  const match = /\.([A-Za-z0-9]{1,10})\s*$/.exec(name);
  return match?.[1]?.toLowerCase() ?? "";
}
