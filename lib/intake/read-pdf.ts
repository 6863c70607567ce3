import { PDFParse } from "pdf-parse";
import type { Deadline } from "./deadline";
import { resolvePdfAssets } from "./pdf-assets";
import { recognizeImage } from "./ocr-engine";
import type { ReadOptions } from "./types";
import { describeDamagedPdf, describePageLimit, describePasswordPdf, UnreadableError } from "./unreadable";

export interface PdfText {
  text: string;
  pageCount: number;
  ocrPages: number;
}

type PdfLimits = Pick<ReadOptions, "maxPages" | "minLettersPerPage" | "ocrScale">;

/**
 * Reads the text layer page by page; a page with too few letters (a scan, or a font without a
 * usable character map) is rendered and OCR'd, and the richer of the two texts is kept.
 */
export async function readPdf(bytes: Uint8Array, limits: PdfLimits, deadline: Deadline): Promise<PdfText> {
  // A copy, because pdf.js may take over the buffer it is given.
  const parser = new PDFParse({ data: new Uint8Array(bytes), verbosity: 0, ...resolvePdfAssets() });
  const stop = () => void parser.destroy().catch(() => undefined);
  try {
    const { total } = await deadline.race(parser.getInfo(), stop);
    if (total > limits.maxPages) {
      throw new UnreadableError("page_limit", describePageLimit(total, limits.maxPages));
    }
    const pages: string[] = [];
    let ocrPages = 0;
    for (let page = 1; page <= total; page += 1) {
      deadline.check();
      const layer = await deadline.race(parser.getText({ partial: [page], pageJoiner: "" }), stop);
      let text = layer.pages[0]?.text ?? "";
      if (countLetters(text) < limits.minLettersPerPage) {
        const ocrText = await recognizePage(parser, page, limits.ocrScale, deadline, stop);
        ocrPages += 1;
        if (countLetters(ocrText) > countLetters(text)) text = ocrText;
      }
      pages.push(text.trim());
    }
    return { text: pages.join("\n\n").trim(), pageCount: total, ocrPages };
  } catch (error) {
    throw translatePdfError(error);
  } finally {
    await parser.destroy().catch(() => undefined);
  }
}

export function countLetters(text: string): number {
  return text.match(/\p{L}/gu)?.length ?? 0;
}

async function recognizePage(
  parser: PDFParse,
  page: number,
  scale: number,
  deadline: Deadline,
  stop: () => void,
): Promise<string> {
  const shot = await deadline.race(
    parser.getScreenshot({ partial: [page], scale, imageBuffer: true, imageDataUrl: false }),
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
