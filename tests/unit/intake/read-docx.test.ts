import JSZip from "jszip";
import { describe, expect, it } from "vitest";
import { readDocument } from "@/lib/intake/read-document";
import { sniffFile } from "@/lib/intake/sniff-file";
import { makeDocx } from "@/tests/helpers/make-files";
import { makeLyingPart, makeTinyPart, makeZeroPart, repackDocx } from "../../helpers/make-hostile-files";

const DOCX = "application/vnd.openxmlformats-officedocument.wordprocessingml.document";
const PARAGRAPHS = [
  "Lease agreement for Unit 4B, 1200 Alder Street.",
  "Tenant: Bluefin Dental PLLC. Term: 36 months from 1 March 2026.",
  "Monthly rent of 3,150 dollars is due on the first day of each month.",
];
const BOMB_ENDING =
  "far beyond any real document, so Foldwright did not open it: it may be damaged or made to cause harm. The original is kept and you can still file it by hand, or ask the sender to save it again and resend it.";

describe("readDocx through readDocument", () => {
  it("reads a Word file's paragraphs word for word", async () => {
    const outcome = await readDocument(await makeDocx(PARAGRAPHS), DOCX);
    expect(outcome).toMatchObject({ status: "ready", pageCount: 1, ocrUsed: false });
    if (outcome.status === "ready") expect(outcome.text).toBe(PARAGRAPHS.join("\n\n"));
  });

  it("still reads a Word file re-packed by another zip writer", async () => {
    const outcome = await readDocument(await repackDocx(await makeDocx(PARAGRAPHS), []), DOCX);
    expect(outcome).toMatchObject({ status: "ready", text: PARAGRAPHS.join("\n\n") });
  });

  it("refuses a zip bomb (a valid .docx plus 300 MB of zeros) from its central directory", { timeout: 30_000 }, async () => {
    const bomb = await repackDocx(await makeDocx(PARAGRAPHS), [await makeZeroPart("word/media/filler.bin", 300)]);
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024); // small on the wire, huge unpacked
    // It passes the type check: the danger only shows when it is unpacked.
    expect(await sniffFile(bomb, "lease.docx")).toMatchObject({ ok: true, kind: "docx" });
    const outcome = await readDocument(bomb, DOCX);
    expect(outcome).toMatchObject({
      status: "unreadable",
      code: "zip_bomb",
      reason: `This Word file would unpack to 300 MB (the limit is 200 MB), ${BOMB_ENDING}`,
    });
  });

  it("refuses a Word file with thousands of parts", async () => {
    const docx = await makeDocx(PARAGRAPHS);
    const ownParts = Object.values((await JSZip.loadAsync(docx)).files).filter((f) => !f.dir).length;
    const extra = Array.from({ length: 2_001 - ownParts }, (_, i) => makeTinyPart(`customXml/item${i}.xml`));
    const outcome = await readDocument(await repackDocx(docx, extra), DOCX);
    expect(outcome).toMatchObject({
      code: "zip_bomb",
      reason: `This Word file holds 2,001 parts (the limit is 2,000), ${BOMB_ENDING}`,
    });
  });

  it("refuses a part that declares 1 KB but unpacks to 8 MB, before mammoth inflates it", async () => {
    const liar = makeLyingPart("word/media/image1.png", 8 * 1024 * 1024, 1024);
    const outcome = await readDocument(await repackDocx(await makeDocx(PARAGRAPHS), [liar]), DOCX);
    expect(outcome).toMatchObject({
      code: "zip_bomb",
      reason: `This Word file holds a part (word/media/image1.png) that unpacks to more than it declares, ${BOMB_ENDING}`,
    });
  });

  it("takes a size saturated at 4 GiB (0xFFFFFFFF) without a Zip64 field at face value", async () => {
    const saturated = makeLyingPart("word/media/image2.png", 16, 0xffffffff);
    const outcome = await readDocument(await repackDocx(await makeDocx(PARAGRAPHS), [saturated]), DOCX);
    expect(outcome).toMatchObject({ code: "zip_bomb" });
    if (outcome.status === "unreadable") expect(outcome.reason).toMatch(/^This Word file would unpack to 4,096 MB /);
  });

  it("calls a truncated Word file damaged", async () => {
    const whole = await makeDocx(PARAGRAPHS);
    const outcome = await readDocument(whole.subarray(0, Math.floor(whole.length * 0.6)), DOCX);
    expect(outcome).toMatchObject({
      status: "unreadable",
      code: "docx_damaged",
      reason:
        "This Word file is damaged or is not a real .docx document, so Foldwright cannot read it. The original is kept and you can still file it by hand, or open it in Word, save it again as .docx and upload that.",
    });
  });

  it("calls a zip without a Word document inside damaged", async () => {
    const outcome = await readDocument(await repackDocx(await makeDocx([]), []).then(stripDocumentXml), DOCX);
    expect(outcome).toMatchObject({ status: "unreadable", code: "docx_damaged" });
  });
});

// Renames word/document.xml in place (same length), leaving a valid zip that is not a Word file.
function stripDocumentXml(zip: Uint8Array): Uint8Array {
  const text = Buffer.from(zip).toString("latin1").replaceAll("word/document.xml", "word/documenx.xml");
  return new Uint8Array(Buffer.from(text, "latin1"));
}
