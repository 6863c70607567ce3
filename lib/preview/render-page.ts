// One page of a document's original as a PNG, for the preview beside the text read. Pure: bytes
// in, image out (no database, no storage). PDFs are rendered by pdf.js (pdf-parse's screenshot,
// drawn with @napi-rs/canvas) at a fixed width, so a scan declared at 72 dpi is not rendered as a
// poster; images are shown as they are (PNG as is, JPEG and TIFF pages converted with sharp);
// Word files, which have no fixed pages, as their text layout: headings, paragraphs and list
// items from mammoth's HTML, wrapped and paginated on A4 at 150 dpi in Liberation Sans.
import { existsSync } from "node:fs";
import path from "node:path";
import { createCanvas, GlobalFonts, type SKRSContext2D } from "@napi-rs/canvas";
import mammoth from "mammoth";
import { PDFParse } from "pdf-parse";
import sharp from "sharp";
import { resolvePdfAssets } from "@/lib/intake/pdf-assets";
import { maskSensitive } from "@/lib/intake/sensitive";

/** Width of a rendered page in pixels: A4 at 150 dpi (210 mm / 25.4 × 150 ≈ 1240), sharp on a laptop at 2× zoom-out. */
export const PREVIEW_WIDTH = 1240;
const A4_HEIGHT = 1754; // 297 mm at 150 dpi
const MARGIN = 118; // 20 mm at 150 dpi
/** Pages a Word file's layout may run to; the rest is in the original (a bound, our choice). */
export const DOCX_MAX_PAGES = 60;

export interface PreviewPage {
  png: Buffer;
  pageCount: number;
}

export class PreviewError extends Error {
  constructor(
    readonly code: "no_such_page" | "unsupported" | "unreadable",
    message: string,
  ) {
    super(message);
  }
}

const noPage = (page: number, count: number) => new PreviewError("no_such_page", `This document has ${count} page${count === 1 ? "" : "s"}; there is no page ${page}.`);

export async function renderPreviewPage(bytes: Uint8Array, mediaType: string, page: number): Promise<PreviewPage> {
  const kind = mediaType.split(";")[0].trim().toLowerCase();
  if (kind === "application/pdf") return renderPdfPage(bytes, page);
  if (kind === "image/png" || kind === "image/jpeg" || kind === "image/tiff") return renderImagePage(bytes, kind, page);
  if (kind === "application/vnd.openxmlformats-officedocument.wordprocessingml.document") return renderDocxPage(bytes, page);
  throw new PreviewError("unsupported", "Foldwright makes previews of PDF, Word, PNG, JPEG and TIFF files only. Download the original to see it.");
}

async function renderPdfPage(bytes: Uint8Array, page: number): Promise<PreviewPage> {
  const parser = new PDFParse({ data: new Uint8Array(bytes), verbosity: 0, ...resolvePdfAssets() });
  try {
    const { total } = await parser.getInfo();
    if (page > total) throw noPage(page, total);
    const shot = await parser.getScreenshot({ partial: [page], desiredWidth: PREVIEW_WIDTH, imageBuffer: true, imageDataUrl: false });
    const data = shot.pages[0]?.data;
    if (!data) throw new PreviewError("unreadable", "This page could not be drawn. Download the original to see it.");
    return { png: Buffer.from(data), pageCount: total };
  } catch (e) {
    if (e instanceof PreviewError) throw e;
    throw new PreviewError("unreadable", "The original could not be drawn (it may be damaged or protected by a password). Download it to see it.");
  } finally {
    await parser.destroy().catch(() => undefined);
  }
}

async function renderImagePage(bytes: Uint8Array, kind: string, page: number): Promise<PreviewPage> {
  try {
    const pages = kind === "image/tiff" ? ((await sharp(bytes).metadata()).pages ?? 1) : 1;
    if (page > pages) throw noPage(page, pages);
    // A PNG is shown byte for byte; other images become PNG (browsers do not show TIFF).
    if (kind === "image/png") return { png: Buffer.from(bytes), pageCount: 1 };
    return { png: await sharp(bytes, { page: page - 1 }).rotate().png().toBuffer(), pageCount: pages };
  } catch (e) {
    if (e instanceof PreviewError) throw e;
    throw new PreviewError("unreadable", "This image could not be decoded. Download the original to see it.");
  }
}

// --- Word: the text layout ---------------------------------------------------------------

interface Block {
  text: string;
  size: number; // px
  bold: boolean;
  indent: number; // px
  gapBefore: number; // px
}

const STYLES: Record<string, Omit<Block, "text">> = {
  h1: { size: 40, bold: true, indent: 0, gapBefore: 28 },
  h2: { size: 32, bold: true, indent: 0, gapBefore: 24 },
  h3: { size: 27, bold: true, indent: 0, gapBefore: 20 },
  h4: { size: 24, bold: true, indent: 0, gapBefore: 16 },
  h5: { size: 23, bold: true, indent: 0, gapBefore: 14 },
  h6: { size: 23, bold: true, indent: 0, gapBefore: 14 },
  p: { size: 23, bold: false, indent: 0, gapBefore: 12 }, // 11 pt at 150 dpi
  li: { size: 23, bold: false, indent: 36, gapBefore: 6 },
};
const LINE = 1.35;
const FONT = "Foldwright Preview Sans";

let fontsReady = false;
function registerFonts(): void {
  if (fontsReady) return;
  fontsReady = true;
  const dir = resolvePdfAssets().standardFontDataUrl;
  for (const file of ["LiberationSans-Regular.ttf", "LiberationSans-Bold.ttf"]) {
    const full = dir && path.join(dir, file);
    // turbopackIgnore: run-time files inside node_modules, not something the build should trace.
    if (full && existsSync(/*turbopackIgnore: true*/ full)) GlobalFonts.registerFromPath(full, FONT);
  }
}

const ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', "#39": "'", nbsp: " " };
const decode = (s: string) => s.replace(/&(amp|lt|gt|quot|#39|nbsp);/g, (_, e: string) => ENTITIES[e]).replace(/&#(\d+);/g, (_, n: string) => String.fromCodePoint(Number(n)));

/** Headings, paragraphs and list items of mammoth's HTML, in order, with their text masked. */
export function docxBlocks(html: string): Block[] {
  const blocks: Block[] = [];
  for (const m of html.matchAll(/<(h[1-6]|p|li)\b[^>]*>([\s\S]*?)<\/\1>/g)) {
    const text = maskSensitive(decode(m[2].replace(/<br\s*\/?>/g, "\n").replace(/<[^>]+>/g, "")).trim());
    if (text) blocks.push({ text: m[1] === "li" ? `•  ${text}` : text, ...STYLES[m[1]] });
  }
  return blocks;
}

function wrap(ctx: SKRSContext2D, text: string, width: number): string[] {
  const lines: string[] = [];
  for (const para of text.split("\n")) {
    let line = "";
    for (const word of para.split(/\s+/).filter(Boolean)) {
      const next = line ? `${line} ${word}` : word;
      if (ctx.measureText(next).width <= width || !line) line = next;
      else {
        lines.push(line);
        line = word;
      }
    }
    lines.push(line);
  }
  return lines;
}

/** Every line placed on its page: [page index, y, block, line]. */
function layOut(ctx: SKRSContext2D, blocks: Block[]) {
  const placed: { page: number; y: number; block: Block; line: string }[] = [];
  let page = 0;
  let y = MARGIN;
  for (const b of blocks) {
    ctx.font = `${b.bold ? "bold " : ""}${b.size}px "${FONT}"`;
    const height = b.size * LINE;
    y += placed.length && y > MARGIN ? b.gapBefore : 0;
    for (const line of wrap(ctx, b.text, PREVIEW_WIDTH - 2 * MARGIN - b.indent)) {
      if (y + height > A4_HEIGHT - MARGIN) {
        page += 1;
        y = MARGIN;
        if (page >= DOCX_MAX_PAGES) return { placed, pages: DOCX_MAX_PAGES };
      }
      placed.push({ page, y, block: b, line });
      y += height;
    }
  }
  return { placed, pages: page + 1 };
}

async function renderDocxPage(bytes: Uint8Array, page: number): Promise<PreviewPage> {
  let html: string;
  try {
    html = (await mammoth.convertToHtml({ buffer: Buffer.from(bytes) })).value;
  } catch {
    throw new PreviewError("unreadable", "This Word file could not be opened. Download the original to see it.");
  }
  registerFonts();
  const canvas = createCanvas(PREVIEW_WIDTH, A4_HEIGHT);
  const ctx = canvas.getContext("2d");
  const { placed, pages } = layOut(ctx, docxBlocks(html));
  if (page > pages) throw noPage(page, pages);
  ctx.fillStyle = "#ffffff";
  ctx.fillRect(0, 0, PREVIEW_WIDTH, A4_HEIGHT);
  ctx.fillStyle = "#1f2430";
  ctx.textBaseline = "top";
  for (const p of placed.filter((x) => x.page === page - 1)) {
    ctx.font = `${p.block.bold ? "bold " : ""}${p.block.size}px "${FONT}"`;
    ctx.fillText(p.line, MARGIN + p.block.indent, p.y);
  }
  if (placed.length === 0) {
    ctx.font = `italic 23px "${FONT}"`;
    ctx.fillText("This Word file has no text.", MARGIN, MARGIN);
  }
  return { png: await canvas.encode("png"), pageCount: pages };
}
