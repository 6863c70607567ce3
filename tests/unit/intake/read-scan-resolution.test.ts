import { afterAll, describe, expect, it } from "vitest";
import { readDocument, shutdownOcr } from "@/lib/intake";
import { chooseRenderWidth } from "@/lib/intake/read-pdf";
import { makeScanPdf, renderScanPng } from "../../helpers/make-files";
import { measureWordRecall } from "./word-recall";

// Scans read at their own resolution: the same generated page as a PNG, as a PDF whose page size
// is declared at 72 dpi (the image's pixels become points: a 23.6-inch page) and as one declared
// at 300 dpi (a 5.7-inch page) must all give back at least 90 % of their words. The reader renders
// each scanned page at its embedded image's own pixel size, so all three OCR the same pixels.
const PAYROLL = [
  "Payroll summary for October 2026",
  "Employer: Harbour Street Bakery Limited, 14 Quay Lane",
  "Employee          Gross pay      Tax withheld     Net pay",
  "Amelia Ortiz          3,250.00           612.40        2,637.60",
  "Jonah Fitzgerald      2,980.00           541.10        2,438.90",
  "Priya Raman           4,105.00           803.25        3,301.75",
  "Totals for the month: gross 10,335.00, withheld 1,956.75",
  "Prepared by the payroll clerk and checked by the partner.",
  "Keep this summary with the quarterly employment tax return.",
];
const OCR_TIMEOUT = 90_000;

afterAll(shutdownOcr);

describe("a scan reads the same whatever resolution its PDF declares", () => {
  for (const variant of ["png", "72 dpi PDF", "300 dpi PDF"] as const) {
    it(`recovers ≥ 90 % of the words from the ${variant}`, { timeout: OCR_TIMEOUT }, async () => {
      const scan = await renderScanPng(PAYROLL);
      const bytes = variant === "png" ? scan.png : await makeScanPdf(scan.png, scan, variant === "72 dpi PDF" ? 72 : 300);
      const outcome = await readDocument(bytes, variant === "png" ? "image/png" : "application/pdf");
      expect(outcome.status).toBe("ready");
      if (outcome.status !== "ready") return;
      expect(outcome.ocrPages).toBe(1);
      const recall = measureWordRecall(PAYROLL, outcome.text);
      console.log(`${variant}: word recall ${recall.toFixed(3)}`);
      expect(recall).toBeGreaterThanOrEqual(0.9);
    });
  }
});

describe("the render width of a scanned page", () => {
  const limits = { ocrScale: 2, maxOcrPixels: 16_000_000 };
  it("is the page-sized image's own width, whatever the page declares", () => {
    const scan = { width: 1700, height: 2200 };
    expect(chooseRenderWidth({ width: 1700, height: 2200 }, [scan], limits)).toBe(1700); // declared at 72 dpi
    expect(chooseRenderWidth({ width: 408, height: 528 }, [scan], limits)).toBe(1700); // declared at 300 dpi
  });
  it("falls back to the page at the render scale when no image covers the page", () => {
    expect(chooseRenderWidth({ width: 595, height: 842 }, [{ width: 200, height: 80 }], limits)).toBe(1190);
  });
  it("keeps within the pixel budget", () => {
    const w = chooseRenderWidth({ width: 612, height: 792 }, [{ width: 6800, height: 8800 }], limits);
    expect(w * w * (792 / 612)).toBeLessThanOrEqual(16_000_000);
    expect(w).toBeGreaterThan(3400);
  });
});

describe("a long scan", () => {
  it("reads every page when OCR takes longer than the whole file's limit: each page has its own", { timeout: 3 * OCR_TIMEOUT }, async () => {
    const pages = await Promise.all([0, 1, 2].map((i) => renderScanPng([`Page ${i + 1} of the lease`, ...PAYROLL.slice(i * 3, i * 3 + 3)])));
    const { PDFDocument } = await import("pdf-lib");
    const pdf = await PDFDocument.create();
    for (const p of pages) {
      const image = await pdf.embedPng(p.png);
      pdf.addPage([612, 792]).drawImage(image, { x: 0, y: 0, width: 612, height: 792 });
    }
    const progress: string[] = [];
    // A whole-file limit of 1 s: no page can be OCR'd within it, so only the per-page limit can let the file through.
    const outcome = await readDocument(await pdf.save(), "application/pdf", { timeLimitMs: 1_000, pageTimeLimitMs: 60_000 }, (done, total) => progress.push(`${done}/${total}`));
    expect(outcome).toMatchObject({ status: "ready", pageCount: 3, ocrPages: 3 });
    if (outcome.status === "ready") for (let i = 1; i <= 3; i += 1) expect(outcome.text).toContain(`Page ${i} of the lease`);
    expect(progress).toEqual(["1/3", "2/3", "3/3"]);
  });
});
