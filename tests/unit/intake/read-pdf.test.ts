import { afterAll, describe, expect, it } from "vitest";
import { shutdownOcr } from "@/lib/intake/ocr-engine";
import { readDocument } from "@/lib/intake/read-document";
import { makeTextPdf } from "@/tests/helpers/make-files";
import { encryptWithQpdf } from "../../helpers/make-hostile-files";

const PDF = "application/pdf";
const PAGE_ONE = [
  "Engagement letter between Harbor Street Bakery LLC and the firm.",
  "Scope: preparation of the 2025 federal and state income tax returns.",
];
const PAGE_TWO = ["Fee schedule: a fixed fee of 2,400 dollars, payable on signing.", "Signed in Portland, Oregon."];

afterAll(shutdownOcr);

describe("readPdf through readDocument", () => {
  it("reads a born-digital PDF's text layer word for word, page by page, without OCR", async () => {
    const outcome = await readDocument(await makeTextPdf([PAGE_ONE, PAGE_TWO]), PDF);
    expect(outcome).toMatchObject({ status: "ready", pageCount: 2, ocrUsed: false, ocrPages: 0 });
    if (outcome.status !== "ready") return;
    expect(outcome.text).toBe([...PAGE_ONE, "", ...PAGE_TWO].join("\n"));
    expect(outcome.charCount).toBe(outcome.text.length);
    expect(outcome.readMs).toBeGreaterThanOrEqual(0);
  });

  it("calls a truncated PDF damaged", async () => {
    const whole = await makeTextPdf([PAGE_ONE, PAGE_TWO]);
    const outcome = await readDocument(whole.subarray(0, Math.floor(whole.length / 2)), PDF);
    expect(outcome).toMatchObject({
      status: "unreadable",
      code: "pdf_damaged",
      reason:
        "This PDF is damaged or incomplete (it may have been cut off while downloading or scanning), so Foldwright cannot read it. The original is kept and you can still file it by hand, or upload a fresh copy.",
    });
  });

  it("asks for an unlocked copy of a password-protected PDF (qpdf, AES-256)", async () => {
    const locked = encryptWithQpdf(await makeTextPdf([PAGE_ONE]));
    const outcome = await readDocument(locked, PDF);
    expect(outcome).toMatchObject({
      status: "unreadable",
      code: "pdf_password",
      reason:
        "This PDF is locked with a password, so Foldwright cannot read its text. The original is kept and you can still file it by hand, or ask the sender for a copy without a password and upload that.",
    });
  });

  it("refuses a PDF past the page limit instead of reading part of it", async () => {
    const outcome = await readDocument(await makeTextPdf([PAGE_ONE, PAGE_TWO, PAGE_TWO]), PDF, { maxPages: 2 });
    expect(outcome).toMatchObject({
      status: "unreadable",
      code: "page_limit",
      reason:
        "This PDF has 3 pages, more than the 2 Foldwright reads in one file. The original is kept and you can still file it by hand, or split it into smaller files and upload those.",
    });
  });
});
