import { afterAll, describe, expect, it } from "vitest";
import { shutdownOcr } from "@/lib/intake/ocr-engine";
import { readDocument } from "@/lib/intake/read-document";
import { makeImagePdf, makeTextPdf, renderTextPng } from "@/tests/helpers/make-files";
import { measureWordRecall } from "./word-recall";

// Each OCR'd page costs a few seconds, so this file reads only a handful of pages in all.
const OCR_TIMEOUT = 60_000;
const NOTICE = [
  "Department of the Treasury, Internal Revenue Service",
  "Notice CP2000 for tax year 2024, dated 14 April 2026",
  "The income and payment information we have on file does not",
  "match the entries on your return. Please review this notice,",
  "sign the response form and mail it within thirty days.",
  "Taxpayer: Marigold Florists LLC, 88 Quarry Road, Salem",
];
const PNG_TYPE = "image/png";

afterAll(shutdownOcr);

describe("OCR of images and scanned PDFs", () => {
  it("reads at least 90% of the words of a clean rendered page", { timeout: OCR_TIMEOUT }, async () => {
    const outcome = await readDocument(await renderTextPng(NOTICE), PNG_TYPE);
    expect(outcome).toMatchObject({ status: "ready", pageCount: 1, ocrUsed: true, ocrPages: 1 });
    if (outcome.status === "ready") expect(measureWordRecall(NOTICE, outcome.text)).toBeGreaterThanOrEqual(0.9);
  });

  it("OCRs a PDF whose only content is an image of text", { timeout: OCR_TIMEOUT }, async () => {
    const scanned = await makeImagePdf([await renderTextPng(NOTICE)]);
    const outcome = await readDocument(scanned, "application/pdf");
    expect(outcome).toMatchObject({ status: "ready", pageCount: 1, ocrUsed: true, ocrPages: 1 });
    if (outcome.status === "ready") expect(measureWordRecall(NOTICE, outcome.text)).toBeGreaterThanOrEqual(0.9);
  });

  it("OCRs only the page without a text layer in a mixed PDF", { timeout: OCR_TIMEOUT }, async () => {
    const typed = await makeTextPdf([["Cover sheet for the scanned notice that follows, filed by the clerk."]]);
    const scan = await makeImagePdf([await renderTextPng(NOTICE)]);
    const mixed = await joinPdfs(typed, scan);
    const outcome = await readDocument(mixed, "application/pdf");
    expect(outcome).toMatchObject({ status: "ready", pageCount: 2, ocrUsed: true, ocrPages: 1 });
    if (outcome.status !== "ready") return;
    expect(outcome.text.startsWith("Cover sheet for the scanned notice that follows, filed by the clerk.")).toBe(true);
    expect(measureWordRecall(NOTICE, outcome.text)).toBeGreaterThanOrEqual(0.9);
  });

  it("turns an image the OCR engine cannot decode into Unreadable, and keeps working", { timeout: OCR_TIMEOUT }, async () => {
    const png = await renderTextPng(NOTICE);
    const broken = png.slice(0, 64); // a PNG signature and header with the pixels cut off
    expect(await readDocument(broken, PNG_TYPE)).toEqual({
      status: "unreadable",
      code: "image_damaged",
      reason:
        "This image is damaged or cannot be opened by the text reader. The original is kept and you can still file it by hand, or scan or photograph the page again and upload that.",
      detail: expect.any(String),
    });
    expect(await readDocument(png, PNG_TYPE)).toMatchObject({ status: "ready", ocrUsed: true });
  });

  it("stops at the time limit, then reads the next file with a fresh OCR worker", { timeout: OCR_TIMEOUT }, async () => {
    const png = await renderTextPng(NOTICE);
    // 50 ms is far below what OCR of a full page takes, so the limit always wins.
    expect(await readDocument(png, PNG_TYPE, { timeLimitMs: 50 })).toEqual({
      status: "unreadable",
      code: "time_limit",
      reason:
        "Reading this file took longer than the 50-millisecond limit, so Foldwright stopped. The original is kept and you can still file it by hand, or split a long scan into smaller files and upload those.",
    });
    const next = await readDocument(png, PNG_TYPE);
    expect(next.status).toBe("ready");
  });

  it("lets a file that times out while waiting for OCR leave the file being read alone", { timeout: OCR_TIMEOUT }, async () => {
    const png = await renderTextPng(NOTICE);
    const first = readDocument(png, PNG_TYPE); // takes the OCR worker
    const second = readDocument(png, PNG_TYPE, { timeLimitMs: 50 }); // queues behind it
    expect(await second).toMatchObject({ status: "unreadable", code: "time_limit" });
    expect(await first).toMatchObject({ status: "ready", ocrUsed: true });
  });
});

async function joinPdfs(...files: Uint8Array[]): Promise<Uint8Array> {
  const { PDFDocument } = await import("pdf-lib");
  const joined = await PDFDocument.create();
  for (const file of files) {
    const source = await PDFDocument.load(file);
    for (const page of await joined.copyPages(source, source.getPageIndices())) joined.addPage(page);
  }
  return joined.save();
}
