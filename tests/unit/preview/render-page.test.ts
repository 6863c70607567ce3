import { afterAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { Deadline } from "@/lib/intake/deadline";
import { recognizeImage, shutdownOcr } from "@/lib/intake/ocr-engine";
import { PREVIEW_WIDTH, PreviewError, renderPreviewPage } from "@/lib/preview/render-page";
import { makeDocx, makeGrayTiff, makeImagePdf, makeTextPdf, renderTextPng } from "../../helpers/make-files";

// Page previews, checked from outside the renderer: the PNG signature (PNG spec, ISO/IEC 15948
// §5.2), the size libvips (sharp) reads from the header, and what tesseract reads on the image.
afterAll(shutdownOcr);

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const DOCX = "application/vnd.openxmlformats-officedocument.wordprocessingml.document";
const ocr = async (png: Buffer) => (await recognizeImage(new Uint8Array(png), new Deadline(60_000))).toLowerCase();

describe("page previews", () => {
  it("draws a scanned PDF's page (no text layer) at the preview width, and its words can be read on it", async () => {
    const scan = await makeImagePdf([await renderTextPng(["INVOICE 4471", "Amount due on receipt"]), await renderTextPng(["Second page"])]);
    const p = await renderPreviewPage(scan, "application/pdf", 1);
    expect([...p.png.subarray(0, 8)]).toEqual(PNG_SIGNATURE);
    expect(p.pageCount).toBe(2);
    const meta = await sharp(p.png).metadata();
    expect(meta.format).toBe("png");
    expect(meta.width).toBe(PREVIEW_WIDTH);
    expect(meta.height).toBeGreaterThan(1700); // A4's 1 : √2 at 1240 px wide ≈ 1754
    expect(await ocr(p.png)).toContain("invoice 4471");
    expect(await ocr((await renderPreviewPage(scan, "application/pdf", 2)).png)).toContain("second page");
  }, 120_000);

  it("answers a page past the end with how many there are", async () => {
    const pdf = await makeTextPdf([["Only page"]]);
    await expect(renderPreviewPage(pdf, "application/pdf", 3)).rejects.toThrow(new PreviewError("no_such_page", "This document has 1 page; there is no page 3."));
  });

  it("lays out a Word file's text on A4 pages, masking sensitive numbers as the text read does", async () => {
    const docx = await makeDocx(["LEASE AGREEMENT", "The tenant shall pay the rent monthly.", "SSN 123-45-6789"]);
    const p = await renderPreviewPage(docx, DOCX, 1);
    const meta = await sharp(p.png).metadata();
    expect([meta.format, meta.width, meta.height, p.pageCount]).toEqual(["png", 1240, 1754, 1]);
    const read = await ocr(p.png);
    expect(read).toContain("lease agreement");
    expect(read).toContain("tenant shall pay");
    expect(read).not.toContain("123-45-6789");
  }, 120_000);

  it("runs a long Word file onto more pages", async () => {
    const docx = await makeDocx(Array.from({ length: 120 }, (_, i) => `Paragraph ${i + 1} of a long agreement, with enough words to wrap across the line at least once.`));
    const p = await renderPreviewPage(docx, DOCX, 2);
    expect(p.pageCount).toBeGreaterThan(2);
    await expect(renderPreviewPage(docx, DOCX, p.pageCount + 1)).rejects.toMatchObject({ code: "no_such_page" });
  });

  it("shows a PNG as it is, and turns JPEG and TIFF into PNG", async () => {
    const png = Buffer.from(await renderTextPng(["A photo"]));
    expect((await renderPreviewPage(png, "image/png", 1)).png.equals(png)).toBe(true);
    const jpeg = await renderPreviewPage(await renderTextPng(["A photo"], "jpeg"), "image/jpeg", 1);
    expect((await sharp(jpeg.png).metadata()).format).toBe("png");
    const tiff = await renderPreviewPage(makeGrayTiff(16, 16), "image/tiff", 1);
    expect(await sharp(tiff.png).metadata()).toMatchObject({ format: "png", width: 16, height: 16 });
  });
});
