// Builds test documents with general-purpose libraries, so the readers are checked against files
// they did not write themselves. Everything is generated in memory; nothing is downloaded.
import { createCanvas, GlobalFonts } from "@napi-rs/canvas";
import { Document, Packer, Paragraph, TextRun } from "docx";
import { createRequire } from "node:module";
import { PDFDocument } from "pdf-lib";
import PDFKit from "pdfkit";

const require = createRequire(import.meta.url);
const FONT_FAMILY = "FoldwrightTestSans";
let fontRegistered = false;

/** A born-digital PDF: one entry per page, each page's lines set in Helvetica by pdfkit. */
export function makeTextPdf(pages: string[][]): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const doc = new PDFKit({ size: "A4", margin: 56 });
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on("error", reject);
    pages.forEach((lines, index) => {
      if (index > 0) doc.addPage();
      doc.fontSize(13).text(lines.join("\n"), { lineGap: 6 });
    });
    doc.end();
  });
}

/** A "scanned" PDF: each page holds only a PNG of text, so there is no text layer at all. */
export async function makeImagePdf(pngPages: Uint8Array[]): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  for (const png of pngPages) {
    const image = await pdf.embedPng(png);
    const page = pdf.addPage([595.28, 841.89]); // A4 in points
    page.drawImage(image, { x: 0, y: 0, width: page.getWidth(), height: page.getHeight() });
  }
  return pdf.save();
}

/**
 * A "scan" PDF whose page is sized from the image and a declared resolution: at 72 dpi a
 * 1700 × 2200 pixel scan becomes a 23.6 × 30.6 inch page (what many phone apps and image-to-PDF
 * tools write), at 300 dpi a 5.7 × 7.3 inch one. The pixels are the same in both.
 */
export async function makeScanPdf(png: Uint8Array, size: { width: number; height: number }, dpi: number): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  const image = await pdf.embedPng(png);
  const page = pdf.addPage([(size.width * 72) / dpi, (size.height * 72) / dpi]);
  page.drawImage(image, { x: 0, y: 0, width: page.getWidth(), height: page.getHeight() });
  return pdf.save();
}

/** A page of text like a 200 dpi scan of a US-letter page (1700 × 2200 pixels, 12-point type). */
export async function renderScanPng(lines: string[]): Promise<{ png: Uint8Array; width: number; height: number }> {
  registerFont();
  const [width, height] = [1700, 2200];
  const canvas = createCanvas(width, height);
  const context = canvas.getContext("2d");
  context.fillStyle = "#ffffff";
  context.fillRect(0, 0, width, height);
  context.fillStyle = "#111111";
  context.font = `34px ${FONT_FAMILY}`; // 12 pt at 200 dpi is 33 px
  lines.forEach((line, index) => context.fillText(line, 150, 220 + index * 62));
  return { png: new Uint8Array(await canvas.encode("png")), width, height };
}

/** A Word file with one paragraph per entry, made by the `docx` package. */
export async function makeDocx(paragraphs: string[]): Promise<Uint8Array> {
  const doc = new Document({
    sections: [{ children: paragraphs.map((text) => new Paragraph({ children: [new TextRun(text)] })) }],
  });
  return new Uint8Array(await Packer.toBuffer(doc));
}

/**
 * A clean page of black text on white, like a 150 dpi scan of an A4 letter, drawn with the
 * Liberation Sans font that ships inside pdfjs-dist (so the test needs no system fonts).
 */
export async function renderTextPng(lines: string[], format: "png" | "jpeg" = "png"): Promise<Uint8Array> {
  registerFont();
  const [width, height] = [1240, 1754];
  const canvas = createCanvas(width, height);
  const context = canvas.getContext("2d");
  context.fillStyle = "#ffffff";
  context.fillRect(0, 0, width, height);
  context.fillStyle = "#111111";
  context.font = `30px ${FONT_FAMILY}`;
  lines.forEach((line, index) => context.fillText(line, 110, 160 + index * 56));
  const encoded = format === "png" ? await canvas.encode("png") : await canvas.encode("jpeg", 90);
  return new Uint8Array(encoded);
}

function registerFont(): void {
  if (fontRegistered) return;
  const fontPath = require.resolve("pdfjs-dist/standard_fonts/LiberationSans-Regular.ttf");
  if (!GlobalFonts.registerFromPath(fontPath, FONT_FAMILY)) throw new Error(`Could not load ${fontPath}.`);
  fontRegistered = true;
}

/**
 * A baseline TIFF (TIFF 6.0: little-endian, 8-bit grey, uncompressed, one strip) of a white page;
 * enough for type detection without a TIFF library.
 */
export function makeGrayTiff(width = 16, height = 16): Uint8Array {
  const tags: [tag: number, type: 3 | 4, value: number][] = [
    [256, 3, width], // ImageWidth
    [257, 3, height], // ImageLength
    [258, 3, 8], // BitsPerSample
    [259, 3, 1], // Compression: none
    [262, 3, 1], // PhotometricInterpretation: black is zero
    [273, 4, 0], // StripOffsets, filled in below
    [277, 3, 1], // SamplesPerPixel
    [278, 3, height], // RowsPerStrip
    [279, 4, width * height], // StripByteCounts
  ];
  const dataOffset = 8 + 2 + tags.length * 12 + 4;
  const file = Buffer.alloc(dataOffset + width * height, 0xff);
  file.write("II", 0, "latin1");
  file.writeUInt16LE(42, 2);
  file.writeUInt32LE(8, 4);
  file.writeUInt16LE(tags.length, 8);
  tags.forEach(([tag, type, value], index) => {
    const at = 10 + index * 12;
    file.writeUInt16LE(tag, at);
    file.writeUInt16LE(type, at + 2);
    file.writeUInt32LE(1, at + 4);
    const field = tag === 273 ? dataOffset : value;
    if (type === 3) file.writeUInt16LE(field, at + 8);
    else file.writeUInt32LE(field, at + 8);
  });
  file.writeUInt32LE(0, 10 + tags.length * 12); // no next image
  return new Uint8Array(file);
}
