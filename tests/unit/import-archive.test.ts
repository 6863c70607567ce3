import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { distance } from "fastest-levenshtein";
import { countFolders, isSystemEntry, placeFiles } from "@/lib/imports/archive-folders";
import { foldName, nameCloseness, proposeMapping, proposeMatter, proposeType } from "@/lib/imports/propose-mapping";
import { eachZipEntry, listZip, type EntryOutcome } from "@/lib/imports/read-zip";
import { makeLyingPart, makePart, makeZip } from "../helpers/make-hostile-files";

// The demo office's cabinet types and some of its matters (db/demo), as the proposal sees them.
const TYPES = ["Engagement & fee letters", "Invoices & receipts", "Bank & card statements", "Tax-authority notices", "Payroll records", "Contracts & leases", "Court filings", "Wills & trust papers", "Corporate minutes", "Correspondence"].map((name, i) => ({ id: i + 1, name }));
const MATTERS = [
  { id: 1, number: "AQ-2026-0101", title: "Harbour bakery lease" },
  { id: 2, number: "AQ-2026-0102", title: "Annual accounts 2025" },
];

const dir = mkdtempSync(path.join(tmpdir(), "import-unit-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("the archive's folders", () => {
  it("strips the zipped folder's own name and reads type and matter folders", () => {
    const placed = placeFiles([
      { path: "Archive/Invoices/a.pdf", size: 10 },
      { path: "Archive/Invoices/AQ-2026-0101/b.pdf", size: 20 },
      { path: "Archive/Correspondence/c.docx", size: 30 },
      { path: "Archive/readme.pdf", size: 5 },
    ]);
    expect(placed.map((p) => [p.relative, p.typeFolder, p.matterFolder])).toEqual([
      ["Invoices/a.pdf", "Invoices", null],
      ["Invoices/AQ-2026-0101/b.pdf", "Invoices", "AQ-2026-0101"],
      ["Correspondence/c.docx", "Correspondence", null],
      ["readme.pdf", null, null],
    ]);
    expect(countFolders(placed)).toEqual([
      { name: "Correspondence", files: 1, bytes: 30, matters: [], loose: 1 },
      { name: "Invoices", files: 2, bytes: 30, matters: [{ name: "AQ-2026-0101", files: 1 }], loose: 1 },
    ]);
  });

  it("keeps a lone type folder as the type (nothing to strip)", () => {
    expect(placeFiles([{ path: "Invoices/a.pdf", size: 1 }, { path: "Invoices/b.pdf", size: 1 }]).map((p) => p.typeFolder)).toEqual(["Invoices", "Invoices"]);
  });

  it("skips folders and operating systems' bookkeeping", () => {
    expect(["Invoices/", "__MACOSX/Invoices/._a.pdf", "Invoices/.DS_Store", "Invoices/Thumbs.db", ".git/config"].map(isSystemEntry)).toEqual([true, true, true, true, true]);
    expect(isSystemEntry("Invoices/a.pdf")).toBe(false);
  });
});

describe("the proposal", () => {
  it("uses Levenshtein distance (Wikipedia's worked example: kitten → sitting is 3)", () => {
    expect(distance("kitten", "sitting")).toBe(3);
  });

  it("maps same names exactly, close names to their type, and unknown names to new types", () => {
    expect(proposeType("Correspondence", TYPES)).toMatchObject({ kind: "existing", cabinetTypeId: 10, match: "exact" });
    expect(proposeType("correspondence", TYPES)).toMatchObject({ kind: "existing", cabinetTypeId: 10, match: "exact" });
    expect(proposeType("Invoices", TYPES)).toMatchObject({ kind: "existing", cabinetTypeId: 2, match: "close" });
    expect(proposeType("Corespondence", TYPES)).toMatchObject({ kind: "existing", cabinetTypeId: 10, match: "close" });
    expect(proposeType("Payroll_Records", TYPES)).toMatchObject({ kind: "existing", cabinetTypeId: 5 });
    expect(proposeType("Board packs", TYPES)).toEqual({ kind: "new", name: "Board packs" });
    expect(proposeType("Franchise", TYPES)).toEqual({ kind: "new", name: "Franchise" });
  });

  it("folds names to lower-case words", () => {
    expect(foldName("Invoices & Receipts")).toBe("invoice and receipt");
    expect(nameCloseness("Contracts", "Contracts & leases")).toBeGreaterThanOrEqual(0.75);
    expect(nameCloseness("Leases", "Wills & trust papers")).toBeLessThan(0.75);
  });

  it("finds matters by number, exact or close", () => {
    expect(proposeMatter("AQ-2026-0102", MATTERS)).toEqual({ matterId: 2, number: "AQ-2026-0102", match: "exact" });
    expect(proposeMatter("aq 2026 0102", MATTERS)).toMatchObject({ matterId: 2, match: "exact" });
    expect(proposeMatter("AQ-2026-0101 Bakery", MATTERS)).toMatchObject({ matterId: 1, match: "close" });
    expect(proposeMatter("AQ-2026-0103", MATTERS)).toMatchObject({ match: "close" }); // one digit off
    expect(proposeMatter("Misc", MATTERS)).toBeNull();
    const [folder] = proposeMapping([{ name: "Invoices", files: 2, bytes: 3, loose: 0, matters: [{ name: "AQ-2026-0101", files: 2 }] }], TYPES, MATTERS);
    expect(folder.matterProposals[0].matter).toMatchObject({ matterId: 1, match: "exact" });
  });
});

describe("reading the zip one entry at a time", () => {
  it("lists entries, then gives each its bytes or its problem", async () => {
    const good = new TextEncoder().encode("%PDF-1.4 a small file");
    const zip = makeZip([
      makePart("Invoices/a.pdf", good),
      { ...makePart("Invoices/locked.pdf", good), encrypted: true },
      makeLyingPart("Invoices/lying.bin", 2 * 1024 * 1024, 1000), // declares 1000 bytes, inflates to 2 MB
      makePart("Invoices/big.bin", new Uint8Array(3000)),
    ]);
    const file = path.join(dir, "a.zip");
    writeFileSync(file, zip);
    const listing = await listZip(file);
    expect(listing.map((e) => [e.path, e.encrypted])).toEqual([["Invoices/a.pdf", false], ["Invoices/locked.pdf", true], ["Invoices/lying.bin", false], ["Invoices/big.bin", false]]);
    const outcomes: Record<number, EntryOutcome> = {};
    await eachZipEntry(file, () => true, 2500, async (p, o) => void (outcomes[p] = o));
    expect(outcomes[0]).toMatchObject({ ok: true });
    expect(Buffer.from((outcomes[0] as { bytes: Buffer }).bytes).equals(Buffer.from(good))).toBe(true);
    expect(outcomes[1]).toMatchObject({ ok: false, code: "encrypted" });
    expect(outcomes[2]).toMatchObject({ ok: false, code: "zip_bomb" });
    expect(outcomes[3]).toMatchObject({ ok: false, code: "too_large" });
  });

  it("skips entries not wanted", async () => {
    const file = path.join(dir, "b.zip");
    writeFileSync(file, makeZip([makePart("x/a.pdf", new Uint8Array([1])), makePart("x/b.pdf", new Uint8Array([2]))]));
    const seen: number[] = [];
    await eachZipEntry(file, (p) => p === 1, 100, async (p) => void seen.push(p));
    expect(seen).toEqual([1]);
  });
});
