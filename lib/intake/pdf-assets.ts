import { existsSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";

export interface PdfAssetOptions {
  standardFontDataUrl?: string;
  cMapUrl?: string;
  cMapPacked?: boolean;
  wasmUrl?: string;
}

let cached: PdfAssetOptions | undefined;

/**
 * Folders inside the pdfjs-dist package (installed with pdf-parse) that pdf.js needs in Node and
 * pdf-parse does not pass: standard fonts to render pages that use non-embedded Helvetica or Times
 * for OCR, character maps to extract text from CJK fonts, and the JPEG 2000 decoder used by some
 * scanners. Local paths only; pdf.js never fetches them. Missing folders are simply left out.
 */
export function resolvePdfAssets(): PdfAssetOptions {
  if (cached) return cached;
  const root = findPdfjsRoot();
  if (!root) return (cached = {});
  // turbopackIgnore: a run-time lookup inside node_modules, not a file the build should trace.
  const folder = (name: string) => (existsSync(/*turbopackIgnore: true*/ path.join(root, name)) ? path.join(root, name) + path.sep : undefined);
  const cMapUrl = folder("cmaps");
  cached = {
    standardFontDataUrl: folder("standard_fonts"),
    ...(cMapUrl ? { cMapUrl, cMapPacked: true } : {}),
    wasmUrl: folder("wasm"),
  };
  return cached;
}

function findPdfjsRoot(): string | undefined {
  try {
    return path.dirname(createRequire(import.meta.url).resolve("pdfjs-dist/package.json"));
  } catch {
    const fallback = path.join(process.cwd(), "node_modules", "pdfjs-dist");
    return existsSync(/*turbopackIgnore: true*/ fallback) ? fallback : undefined;
  }
}
