// The certificate of disposal as a PDF (pdfkit, standard fonts: nothing to embed). It states the
// batch, the decision (who proposed, who approved, when), every destroyed document with its hash
// and the rule that made it due, the documents kept, and the retention caution (DESIGN §8).
import { existsSync } from "node:fs";
import path from "node:path";
import PDFKit from "pdfkit";
import { resolvePdfAssets } from "@/lib/intake/pdf-assets";
import type { Certificate, CertificateItem } from "./certificate-types";

// Names must print as stored. pdfkit's built-in fonts know only Windows-1252, so the certificate
// embeds Liberation Sans (Latin, Greek, Cyrillic), which pdfjs-dist — already installed for
// reading — ships among its standard fonts; Helvetica only if that folder is missing. The CSV
// carries every name exactly, whatever its script.
function fontFiles(): { regular: string; bold: string } {
  const dir = resolvePdfAssets().standardFontDataUrl;
  const regular = dir && path.join(dir, "LiberationSans-Regular.ttf");
  const bold = dir && path.join(dir, "LiberationSans-Bold.ttf");
  // turbopackIgnore: run-time files inside node_modules, not something the build should trace.
  if (regular && bold && existsSync(/*turbopackIgnore: true*/ regular) && existsSync(/*turbopackIgnore: true*/ bold)) return { regular, bold };
  return { regular: "Helvetica", bold: "Helvetica-Bold" };
}

const MARGIN = 48; // points: two thirds of an inch, room for a binder's holes
const BODY = 9;

const day = (iso: string | null) => (iso ? iso.slice(0, 16).replace("T", " ") : "–");

function item(doc: PDFKit.PDFDocument, i: CertificateItem, width: number): void {
  if (doc.y > doc.page.height - MARGIN - 70) doc.addPage();
  doc.font("Body-Bold").fontSize(BODY).text(`#${i.documentId}  ${i.name}`, { width });
  doc.font("Body").text(`${i.cabinetType ?? "no cabinet type"} · matter ${i.matter ?? "none"} · ${i.rule}, retention date ${i.dueOn}`, { width });
  doc.text(`Uploaded ${day(i.uploadedAt)} UTC · filed ${day(i.filedAt)} UTC · destroyed ${day(i.disposedAt)} UTC`, { width });
  doc.text(`Rule source: ${i.ruleSource}`, { width });
  doc.text(`SHA-256 ${i.sha256}`, { width });
  doc.moveDown(0.5);
}

export function certificatePdf(c: Certificate, created: Date = new Date()): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFKit({ size: "A4", margin: MARGIN, info: { Title: `Certificate of disposal, batch ${c.batchId}`, Creator: "Foldwright", CreationDate: created } });
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    const width = doc.page.width - 2 * MARGIN;
    const f = fontFiles();
    doc.registerFont("Body", f.regular);
    doc.registerFont("Body-Bold", f.bold);

    doc.font("Body-Bold").fontSize(18).text("Certificate of disposal");
    doc.font("Body").fontSize(BODY).moveDown(0.3);
    doc.text(`Disposal batch #${c.batchId}. ${c.destroyed.length} ${c.destroyed.length === 1 ? "document was" : "documents were"} destroyed: each original deleted from storage and its text cleared; a tombstone record (name, hash, cabinet type, matter, dates, rule) is kept.`, { width });
    doc.moveDown(0.5);
    doc.text(`Proposed by ${c.proposedBy} on ${day(c.proposedAt)} UTC. Note: ${c.note}`, { width });
    doc.text(`Approved by ${c.approvedBy} on ${day(c.approvedAt)} UTC.`, { width });
    doc.text(`This certificate was made by Foldwright on ${day(created.toISOString())} UTC from the batch's record.`, { width });
    doc.moveDown(0.5);
    doc.font("Body-Bold").text("Caution", { width }).font("Body").text(c.caution, { width });
    doc.moveDown(0.8);

    doc.font("Body-Bold").fontSize(13).text("Documents destroyed");
    doc.moveDown(0.3);
    for (const i of c.destroyed) item(doc, i, width);
    if (c.kept.length) {
      doc.moveDown(0.5).font("Body-Bold").fontSize(13).text("Documents kept (not destroyed)");
      doc.font("Body").fontSize(BODY).text("Proposed in this batch but kept at approval: under a legal hold placed after the proposal, or no longer past the retention date.", { width });
      doc.moveDown(0.3);
      for (const i of c.kept) doc.text(`#${i.documentId}  ${i.name} — ${i.outcome === "kept_hold" ? "legal hold" : "no longer due"}`, { width });
    }
    doc.end();
  });
}
