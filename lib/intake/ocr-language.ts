import { existsSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";

const DATA_DIR = "4.0.0_best_int";
const DATA_FILE = "eng.traineddata.gz";

/**
 * The folder holding English OCR data from the @tesseract.js-data/eng npm package. tesseract.js
 * falls back to downloading the data when it is missing, and that failure escapes try/catch and
 * ends the process (STACK-NOTES, OCR), so we refuse to start OCR without the file on disk.
 */
export function resolveOcrLanguagePath(): string {
  const candidates = [resolveFromPackage(), path.join(process.cwd(), "node_modules", "@tesseract.js-data", "eng")];
  for (const dir of candidates) {
    if (dir && existsSync(path.join(dir, DATA_DIR, DATA_FILE))) return path.join(dir, DATA_DIR);
  }
  throw new Error(
    `OCR language data (${DATA_DIR}/${DATA_FILE}) is missing from @tesseract.js-data/eng; run npm ci.`,
  );
}

function resolveFromPackage(): string | undefined {
  try {
    const require = createRequire(import.meta.url);
    return path.dirname(require.resolve("@tesseract.js-data/eng/package.json"));
  } catch {
    // Bundled builds may not resolve packages from here; the working-directory path covers that.
    return undefined;
  }
}
