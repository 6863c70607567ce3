// Shapes shared by the intake readers and checks. Kept free of Node and library types so the
// route, the reading job and the screens can import them without pulling in the readers.

/** The kinds of file Foldwright keeps, as decided from the bytes (never from the name). */
export type FileKind = "pdf" | "docx" | "png" | "jpeg" | "tiff";

/** A refusal the upload route turns into `{ error: { code, message } }` with `status`. */
export interface IntakeError {
  status: 413 | 415 | 422;
  code: "too_large" | "empty" | "unsupported_type" | "unknown_type";
  message: string;
}

export type SniffResult =
  | { ok: true; kind: FileKind; mediaType: string; extension: string; nameMatches: boolean }
  | { ok: false; error: IntakeError };

/** Limits for one reading. Every field has a default in `read-options.ts`. */
export interface ReadOptions {
  /** Wall-clock budget for the whole file; an OCR'd PDF page counts against its own budget instead. */
  timeLimitMs: number;
  /** Wall-clock budget for one OCR'd PDF page (rendering and recognition), so a long scan reads in full. */
  pageTimeLimitMs: number;
  /** A scanned page is rendered at its image's own pixel size, but never past this many pixels. */
  maxOcrPixels: number;
  /** A PDF with more pages than this is Unreadable rather than read in part. */
  maxPages: number;
  /** A PDF page whose text layer has fewer letters than this is rendered and OCR'd. */
  minLettersPerPage: number;
  /** Render scale for OCR of PDF pages without a page-sized image; 2 (about 144 dpi) is what tesseract reads well. */
  ocrScale: number;
  /** DOCX: the central directory may declare at most this many unpacked bytes in total. */
  maxUnzippedBytes: number;
  /** DOCX: at most this many entries in the zip. */
  maxZipEntries: number;
}

export type UnreadableCode =
  | "pdf_password"
  | "pdf_damaged"
  | "page_limit"
  | "docx_damaged"
  | "zip_bomb"
  | "image_damaged"
  | "time_limit"
  | "unsupported_type"
  | "reader_failed";

export interface ReadyText {
  status: "ready";
  text: string;
  pageCount: number;
  ocrUsed: boolean;
  /** How many pages (or images) went through OCR; 0 when the text layer sufficed. */
  ocrPages: number;
  charCount: number;
  readMs: number;
}

export interface UnreadableFile {
  status: "unreadable";
  code: UnreadableCode;
  /** A sentence for the clerk: what happened, that the original is kept, what to do. */
  reason: string;
  /** The underlying error message, for logs only; never shown to the clerk. */
  detail?: string;
}

export type ReadOutcome = ReadyText | UnreadableFile;
