import type { UnreadableCode, UnreadableFile } from "./types";

// Every reason ends by saying the original is safe and can be filed by hand, because that is the
// clerk's next step whatever went wrong (DESIGN §3, "Unreadable").
const KEPT = "The original is kept and you can still file it by hand";

/** Thrown inside the readers; `readDocument` turns it into an Unreadable outcome. */
export class UnreadableError extends Error {
  constructor(
    readonly code: UnreadableCode,
    readonly reason: string,
    readonly detail?: string,
  ) {
    super(reason);
    this.name = "UnreadableError";
  }

  toOutcome(): UnreadableFile {
    const outcome: UnreadableFile = { status: "unreadable", code: this.code, reason: this.reason };
    return this.detail ? { ...outcome, detail: this.detail } : outcome;
  }
}

export function describePasswordPdf(): string {
  return `This PDF is locked with a password, so Foldwright cannot read its text. ${KEPT}, or ask the sender for a copy without a password and upload that.`;
}

export function describeDamagedPdf(): string {
  return `This PDF is damaged or incomplete (it may have been cut off while downloading or scanning), so Foldwright cannot read it. ${KEPT}, or upload a fresh copy.`;
}

export function describePageLimit(pageCount: number, maxPages: number): string {
  return `This PDF has ${pageCount} pages, more than the ${maxPages} Foldwright reads in one file. ${KEPT}, or split it into smaller files and upload those.`;
}

export function describeDamagedDocx(): string {
  return `This Word file is damaged or is not a real .docx document, so Foldwright cannot read it. ${KEPT}, or open it in Word, save it again as .docx and upload that.`;
}

/** `finding` completes "This Word file …", e.g. "would unpack to 300 MB (the limit is 200 MB)". */
export function describeZipBomb(finding: string): string {
  return `This Word file ${finding}, far beyond any real document, so Foldwright did not open it: it may be damaged or made to cause harm. ${KEPT}, or ask the sender to save it again and resend it.`;
}

export function describeDamagedImage(): string {
  return `This image is damaged or cannot be opened by the text reader. ${KEPT}, or scan or photograph the page again and upload that.`;
}

export function describeTimeLimit(timeLimitMs: number): string {
  return `Reading this file took longer than the ${formatDuration(timeLimitMs)} limit, so Foldwright stopped. ${KEPT}, or split a long scan into smaller files and upload those.`;
}

export function describeUnsupported(mediaType: string): string {
  return `Foldwright has no reader for this kind of file (${mediaType}). ${KEPT}.`;
}

export function describeReaderFailure(): string {
  return `Foldwright could not read this file because its reader failed unexpectedly. ${KEPT}, or upload it again later.`;
}

function formatDuration(ms: number): string {
  if (ms >= 60_000 && ms % 60_000 === 0) return `${ms / 60_000}-minute`;
  if (ms >= 1_000) return `${Math.round(ms / 1_000)}-second`;
  return `${ms}-millisecond`;
}
