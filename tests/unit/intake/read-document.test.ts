import { describe, expect, it } from "vitest";
import { readDocument } from "@/lib/intake/read-document";
import { DEFAULT_READ_OPTIONS } from "@/lib/intake/read-options";
import { makeDocx } from "@/tests/helpers/make-files";

describe("readDocument", () => {
  it("answers Unreadable, not an exception, for a media type it has no reader for", async () => {
    expect(await readDocument(new Uint8Array([1, 2, 3]), "application/zip")).toEqual({
      status: "unreadable",
      code: "unsupported_type",
      reason: "Foldwright has no reader for this kind of file (application/zip). The original is kept and you can still file it by hand.",
    });
  });

  it("accepts a media type with parameters and any case", async () => {
    const docx = await makeDocx(["Minutes of the annual meeting"]);
    const mediaType = "Application/VND.openxmlformats-officedocument.wordprocessingml.document; charset=binary";
    expect(await readDocument(docx, mediaType)).toMatchObject({ status: "ready", text: "Minutes of the annual meeting" });
  });

  it("refuses nonsense limits before touching the file", async () => {
    await expect(readDocument(new Uint8Array(1), "application/pdf", { maxPages: 0 })).rejects.toThrow(
      "Read option maxPages must be a positive number, got 0.",
    );
  });

  it("ships limits sized for office paper", () => {
    expect(DEFAULT_READ_OPTIONS).toEqual({
      timeLimitMs: 120_000,
      pageTimeLimitMs: 60_000,
      maxOcrPixels: 16_000_000,
      maxPages: 500,
      minLettersPerPage: 20,
      ocrScale: 2,
      maxUnzippedBytes: 200 * 1024 * 1024,
      maxZipEntries: 2_000,
    });
  });
});
