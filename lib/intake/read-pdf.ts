import { PDFParse } from "pdf-parse";
import { Deadline } from "./deadline";
import { resolvePdfAssets } from "./pdf-assets";
import { ocrWorkerCount, recognizeImage } from "./ocr-engine";
import type { ReadOptions } from "./types";
import { describeDamagedPdf, describePageLimit, describePasswordPdf, UnreadableError } from "./unreadable";

export interface PdfText {
  text: string;
  pageCount: number;
  ocrPages: number;
}

/** Called after each OCR'd page: how many of the file's OCR pages are done. */
export type PageProgress = (done: number, total: number) => void;

type PdfLimits = Pick<ReadOptions, "maxPages" | "minLettersPerPage" | "ocrScale" | "pageTimeLimitMs" | "maxOcrPixels">;

// A page-sized image's aspect ratio within this of the page's is a scan of the whole page.
const SCAN_ASPECT_TOLERANCE = 0.03;
// Below this width an image is upscaled to it: tesseract reads 10-point type poorly under ~100 dpi.
const MIN_RENDER_WIDTH = 1000;

/**
 * Reads the text layer page by page; a page with too few letters (a scan, or a font without a
 * usable character map) is rendered and OCR'd, and the richer of the two texts is kept.
 *
 * Scans are rendered at their embedded image's own pixel size, not at a scale of the page's
 * declared size: many phone apps and image-to-PDF tools declare 72 dpi, so a 1700 × 2200 pixel
 * scan becomes a 23.6-inch page that a fixed scale blows up, while a 300-dpi declaration shrinks
 * the same scan to a thumbnail. Rendering at the image's pixels gives tesseract what the scanner
 * saw (bounded by `maxOcrPixels`). Each OCR'd page has its own time limit (`pageTimeLimitMs`),
 * and the time it takes is given back to the whole file's budget, so a 60-page scan reads in
 * full; the pages are spread over the OCR workers.
 */
export async function readPdf(bytes: Uint8Array, limits: PdfLimits, deadline: Deadline, onPage?: PageProgress): Promise<PdfText> {
  // A copy, because pdf.js may take over the buffer it is given.
  const parser = new PDFParse({ data: new Uint8Array(bytes), verbosity: 0, ...resolvePdfAssets() });
  const stop = () => void parser.destroy().catch(() => undefined);
  try {
    const { total } = await deadline.race(parser.getInfo(), stop);
    if (total > limits.maxPages) {
      throw new UnreadableError("page_limit", describePageLimit(total, limits.maxPages));
    }
    const pages: string[] = [];
    const needOcr: number[] = [];
    for (let page = 1; page <= total; page += 1) {
      deadline.check();
      const layer = await deadline.race(parser.getText({ partial: [page], pageJoiner: "" }), stop);
      const text = layer.pages[0]?.text ?? "";
      pages.push(text);
      if (countLetters(text) < limits.minLettersPerPage) needOcr.push(page);
    }
    await ocrPages(parser, needOcr, limits, deadline, (page, ocrText) => {
      if (countLetters(ocrText) > countLetters(pages[page - 1])) pages[page - 1] = ocrText;
    }, onPage);
    return { text: pages.map((p) => p.trim()).join("\n\n").trim(), pageCount: total, ocrPages: needOcr.length };
  } catch (error) {
    throw translatePdfError(error);
  } finally {
    await parser.destroy().catch(() => undefined);
  }
}

export function countLetters(text: string): number {
  return text.match(/\p{L}/gu)?.length ?? 0;
}

/** OCRs the pages, as many at once as there are OCR workers; each page within its own time limit. */
async function ocrPages(
  parser: PDFParse,
  pages: number[],
  limits: PdfLimits,
  file: Deadline,
  keep: (page: number, text: string) => void,
  onPage?: PageProgress,
): Promise<void> {
  const queue = [...pages];
  let done = 0;
  const lane = async () => {
    for (let page = queue.shift(); page !== undefined; page = queue.shift()) {
      const started = performance.now();
      const own = new Deadline(limits.pageTimeLimitMs);
      keep(page, await recognizePage(parser, page, limits, own));
      file.extend(performance.now() - started);
      onPage?.(++done, pages.length);
    }
  };
  await Promise.all(Array.from({ length: Math.min(ocrWorkerCount(), pages.length) }, lane));
}

/** The render width for OCR: a page-sized image's own width, else the page at `ocrScale`; within the pixel budget. */
export function chooseRenderWidth(page: { width: number; height: number }, images: { width: number; height: number }[], limits: Pick<PdfLimits, "ocrScale" | "maxOcrPixels">): number {
  const aspect = page.height / page.width;
  const scan = images
    .filter((i) => Math.abs(i.height / i.width - aspect) <= SCAN_ASPECT_TOLERANCE * aspect)
    .sort((a, b) => b.width * b.height - a.width * a.height)[0];
  const wanted = scan ? Math.max(scan.width, MIN_RENDER_WIDTH) : page.width * limits.ocrScale;
  const budget = Math.sqrt(limits.maxOcrPixels / aspect);
  return Math.max(1, Math.floor(Math.min(wanted, budget)));
}

async function recognizePage(parser: PDFParse, page: number, limits: PdfLimits, deadline: Deadline): Promise<string> {
  const stop = () => void parser.destroy().catch(() => undefined);
  const info = await deadline.race(parser.getInfo({ parsePageInfo: true, partial: [page] }), stop);
  const size = info.pages.find((p) => p.pageNumber === page) ?? info.pages[0];
  const found = await deadline.race(parser.getImage({ partial: [page], imageBuffer: false, imageDataUrl: false, imageThreshold: 80 }), stop);
  const images = (found.pages[0]?.images ?? []).map((i) => ({ width: i.width, height: i.height }));
  const desiredWidth = size ? chooseRenderWidth(size, images, limits) : undefined;
  const shot = await deadline.race(
    parser.getScreenshot({ partial: [page], ...(desiredWidth ? { desiredWidth } : { scale: limits.ocrScale }), imageBuffer: true, imageDataUrl: false }),
    stop,
  );
  const image = shot.pages[0]?.data;
  return image ? recognizeImage(image, deadline) : "";
}

// pdf-parse names its errors after pdf.js's exceptions; match by name so a second copy of the
// library (bundling) cannot break an instanceof check.
function translatePdfError(error: unknown): unknown {
  if (error instanceof UnreadableError) return error;
  const name = error instanceof Error ? error.name : "";
  const detail = error instanceof Error ? error.message : String(error);
  if (name === "PasswordException") return new UnreadableError("pdf_password", describePasswordPdf(), detail);
  if (name === "InvalidPDFException" || name === "FormatError") {
    return new UnreadableError("pdf_damaged", describeDamagedPdf(), detail);
  }
  return error;
}
