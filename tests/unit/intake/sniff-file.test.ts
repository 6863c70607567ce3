import { describe, expect, it } from "vitest";
import { readDocument } from "@/lib/intake/read-document";
import { checkFileSize, sniffFile } from "@/lib/intake/sniff-file";
import { makeDocx, makeGrayTiff, makeTextPdf, renderTextPng } from "@/tests/helpers/make-files";
import { makeElfBytes, makeExeBytes, makeNoiseBytes } from "../../helpers/make-hostile-files";

const KEEPS = "Foldwright keeps PDF, Word (.docx), PNG, JPEG and TIFF files.";

describe("sniffFile accepts what Foldwright keeps, by content", () => {
  it("recognises a PDF, a Word file, PNG, JPEG and TIFF whatever they are called", async () => {
    const pdf = await makeTextPdf([["Fee letter"]]);
    const docx = await makeDocx(["Engagement letter"]);
    const png = await renderTextPng(["Receipt"]);
    const jpeg = await renderTextPng(["Receipt"], "jpeg");
    const cases = [
      [pdf, "scan.pdf", "pdf", "application/pdf", true],
      [docx, "letter.bin", "docx", "application/vnd.openxmlformats-officedocument.wordprocessingml.document", false],
      [png, "receipt.png", "png", "image/png", true],
      [jpeg, "IMG_0001.JPG", "jpeg", "image/jpeg", true],
      [makeGrayTiff(), "fax.tiff", "tiff", "image/tiff", true],
    ] as const;
    for (const [bytes, name, kind, mediaType, nameMatches] of cases) {
      expect(await sniffFile(bytes, name)).toMatchObject({ ok: true, kind, mediaType, nameMatches });
    }
  });
});

describe("sniffFile tolerates what PDF readers tolerate", () => {
  it("accepts a PDF whose header comes after a few stray bytes, and pdf.js reads it", async () => {
    const pdf = await makeTextPdf([["Bank reconciliation for March, prepared by the bookkeeper."]]);
    const shifted = new Uint8Array([...new TextEncoder().encode("\r\n\r\n"), ...pdf]);
    expect(await sniffFile(shifted, "recon.pdf")).toMatchObject({ ok: true, kind: "pdf" });
    expect(await readDocument(shifted, "application/pdf")).toMatchObject({
      status: "ready",
      text: "Bank reconciliation for March, prepared by the bookkeeper.",
    });
  });
});

describe("sniffFile refuses, with a sentence a clerk can act on", () => {
  it("refuses an empty file with 422", async () => {
    expect(await sniffFile(new Uint8Array(0), "blank.pdf")).toEqual({
      ok: false,
      error: {
        status: 422,
        code: "empty",
        message: "This file is empty (0 bytes). Check that it finished saving or downloading, then upload it again.",
      },
    });
  });

  it("refuses random bytes named .pdf as an unknown type with 415", async () => {
    expect(await sniffFile(makeNoiseBytes(4096), "statement.pdf")).toEqual({
      ok: false,
      error: {
        status: 415,
        code: "unknown_type",
        message: `This file is named like a PDF, but its contents are not: it may be damaged, or renamed from another kind of file. ${KEEPS} Open the original and save it as PDF, then upload that.`,
      },
    });
  });

  it("refuses a Windows program renamed .pdf and says so", async () => {
    expect(await sniffFile(makeExeBytes(), "invoice.pdf")).toEqual({
      ok: false,
      error: {
        status: 415,
        code: "unsupported_type",
        message: `This file is a Windows program (.exe), not a document, even though its name ends in .pdf. ${KEEPS} Do not open it; ask the sender what they meant to send.`,
      },
    });
  });

  it("refuses a Linux program without a document-like name", async () => {
    const result = await sniffFile(makeElfBytes(), "tool");
    expect(result).toEqual({
      ok: false,
      error: {
        status: 415,
        code: "unsupported_type",
        message: `This file is a Linux program, not a document. ${KEEPS} Do not open it; ask the sender what they meant to send.`,
      },
    });
  });

  it("refuses a file over the size limit with 413, before looking inside", async () => {
    const bytes = new Uint8Array(3 * 1024 * 1024 + 200 * 1024); // 3.2 MB of zeros
    expect(await sniffFile(bytes, "big.pdf", { maxBytes: 2 * 1024 * 1024 })).toEqual({
      ok: false,
      error: {
        status: 413,
        code: "too_large",
        message:
          "This file is 3.2 MB, more than the 2 MB Foldwright takes in one file. Split it into smaller files, or scan at a lower resolution, and upload those.",
      },
    });
  });

  it("uses 50 MB as the default limit", () => {
    expect(checkFileSize(50 * 1024 * 1024, 50 * 1024 * 1024)).toBeNull();
    expect(checkFileSize(50 * 1024 * 1024 + 1, 50 * 1024 * 1024)?.status).toBe(413);
  });
});
