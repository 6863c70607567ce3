// Lays demo blocks out as a born-digital PDF with pdfkit's standard fonts (nothing to embed, so
// files stay a few kilobytes). The creation date is fixed by the caller: pdfkit derives the
// file ID from it, so the same document gives the same bytes.
import PDFKit from "pdfkit";
import type { Block } from "./doc-model";

export interface PdfStyle {
  font: "Helvetica" | "Times-Roman" | "Courier";
  size: number;
  margin: number;
}

const BOLD: Record<PdfStyle["font"], string> = { Helvetica: "Helvetica-Bold", "Times-Roman": "Times-Bold", Courier: "Courier-Bold" };

/** Draws a table row by row, each cell at its column, breaking pages between rows. */
function drawTable(doc: PDFKit.PDFDocument, rows: string[][], header: boolean, style: PdfStyle): void {
  const width = doc.page.width - 2 * style.margin;
  const columns = Math.max(...rows.map((r) => r.length));
  // The first column holds descriptions, so it gets twice the room of the others.
  const unit = width / (columns + 1);
  const xs = Array.from({ length: columns }, (_, i) => style.margin + (i === 0 ? 0 : unit * (i + 1)));
  const widths = Array.from({ length: columns }, (_, i) => (i === 0 ? unit * 2 : unit) - 6);
  rows.forEach((row, r) => {
    const rowHeight = Math.max(...row.map((cell, i) => doc.heightOfString(cell, { width: widths[i] }))) + 4;
    if (doc.y + rowHeight > doc.page.height - style.margin) doc.addPage();
    const y = doc.y;
    doc.font(header && r === 0 ? BOLD[style.font] : style.font);
    row.forEach((cell, i) => doc.text(cell, xs[i], y, { width: widths[i], align: i === 0 ? "left" : "right" }));
    doc.x = style.margin;
    doc.y = y + rowHeight;
  });
  doc.font(style.font).moveDown(0.5);
}

/** Renders blocks to PDF bytes. */
export function renderPdf(blocks: Block[], style: PdfStyle, info: { title: string; created: Date }): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const doc = new PDFKit({ size: "LETTER", margin: style.margin, info: { Title: info.title, Creator: "Foldwright demo", CreationDate: info.created } });
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on("error", reject);
    doc.font(style.font).fontSize(style.size);
    for (const b of blocks) {
      if (b.kind === "pageBreak") doc.addPage();
      else if (b.kind === "heading") doc.font(BOLD[style.font]).fontSize(style.size + 5).text(b.text).fontSize(style.size).font(style.font).moveDown(0.6);
      else if (b.kind === "subheading") doc.font(BOLD[style.font]).text(b.text).font(style.font).moveDown(0.3);
      else if (b.kind === "paragraph") doc.text(b.text, { align: "left", lineGap: 2 }).moveDown(0.6);
      else if (b.kind === "lines") doc.text(b.lines.join("\n"), { align: b.align ?? "left" }).moveDown(0.6);
      else drawTable(doc, b.rows, b.header ?? false, style);
    }
    doc.end();
  });
}
