import type { ReadOptions } from "./types";

const MB = 1024 * 1024;

// Defaults sized for an office's everyday paper: a 500-page PDF is already a large bundle, and a
// genuine .docx rarely unpacks past a few tens of MB even with photos inside.
export const DEFAULT_READ_OPTIONS: Readonly<ReadOptions> = Object.freeze({
  timeLimitMs: 120_000,
  pageTimeLimitMs: 60_000, // a dense page takes 2.5 s on one core (bench:intake); 60 s allows a loaded machine
  maxOcrPixels: 16_000_000, // a US-letter page at 450 dpi is 16.2 M pixels; 300 dpi scans (8.4 M) fit whole
  maxPages: 500,
  minLettersPerPage: 20,
  ocrScale: 2,
  maxUnzippedBytes: 200 * MB,
  maxZipEntries: 2_000,
});

/** Fills in defaults and refuses nonsense limits early, before any file is touched. */
export function resolveReadOptions(options: Partial<ReadOptions> = {}): ReadOptions {
  const resolved = { ...DEFAULT_READ_OPTIONS, ...options };
  for (const [name, value] of Object.entries(resolved)) {
    if (!Number.isFinite(value) || value <= 0) {
      throw new RangeError(`Read option ${name} must be a positive number, got ${value}.`);
    }
  }
  return resolved;
}
