import { Deadline } from "./deadline";
import { findKindByMediaType } from "./file-kinds";
import { readDocx } from "./read-docx";
import { readImage } from "./read-image";
import { resolveReadOptions } from "./read-options";
import { readPdf, type PageProgress } from "./read-pdf";
import type { FileKind, ReadOptions, ReadOutcome } from "./types";
import { describeReaderFailure, describeUnsupported, UnreadableError } from "./unreadable";

interface KindText {
  text: string;
  pageCount: number;
  ocrPages: number;
}

/**
 * Reads the text of a file already accepted by `sniffFile`. Never rejects for a bad file: every
 * failure becomes an Unreadable outcome with a sentence for the clerk, so one bad upload cannot
 * stop the reading job (or the process) that called it.
 */
export async function readDocument(
  bytes: Uint8Array,
  mediaType: string,
  options: Partial<ReadOptions> = {},
  onPage?: PageProgress,
): Promise<ReadOutcome> {
  const started = performance.now();
  const limits = resolveReadOptions(options);
  const kind = findKindByMediaType(mediaType);
  if (!kind) return new UnreadableError("unsupported_type", describeUnsupported(mediaType)).toOutcome();
  try {
    const read = await readKind(kind, bytes, limits, new Deadline(limits.timeLimitMs), onPage);
    const text = tidyText(read.text);
    return {
      status: "ready",
      text,
      pageCount: read.pageCount,
      ocrUsed: read.ocrPages > 0,
      ocrPages: read.ocrPages,
      charCount: text.length,
      readMs: Math.round(performance.now() - started),
    };
  } catch (error) {
    if (error instanceof UnreadableError) return error.toOutcome();
    return new UnreadableError("reader_failed", describeReaderFailure(), String(error)).toOutcome();
  }
}

async function readKind(kind: FileKind, bytes: Uint8Array, limits: ReadOptions, deadline: Deadline, onPage?: PageProgress): Promise<KindText> {
  switch (kind) {
    case "pdf":
      return readPdf(bytes, limits, deadline, onPage);
    case "docx":
      return { ...(await readDocx(bytes, limits, deadline)), ocrPages: 0 };
    case "png":
    case "jpeg":
    case "tiff":
      return { ...(await readImage(bytes, deadline)), ocrPages: 1 };
  }
}

// NUL and other control characters (tabs and line breaks aside) break the FULLTEXT index and
// the previews; CRLF from Word becomes LF so character counts agree across readers.
function tidyText(text: string): string {
  return text
    .replace(/\r\n?/g, "\n")
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/g, "")
    .trim();
}
