import mammoth from "mammoth";
import { PDFParse } from "pdf-parse";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { DEMO_CABINET_TYPES } from "@/db/demo/cabinet-types";
import { listDemoMatters } from "@/lib/demo/demo-matters";
import { generateDemoDocuments, type DemoDocument } from "@/lib/demo/documents";

// Generating files takes a few seconds; no test here checks how long.
const SLOW = { timeout: 120_000 };
const TYPE_NAMES = DEMO_CABINET_TYPES.map((t) => t.name);
const MATTER_NUMBERS = listDemoMatters().map((m) => m.number);
const squash = (s: string) => s.replace(/\s+/g, " ").trim();

async function readBack(doc: DemoDocument): Promise<{ text: string; pages: number | null }> {
  if (doc.kind === "pdf") {
    const parser = new PDFParse({ data: new Uint8Array(doc.bytes), verbosity: 0 });
    try {
      const result = await parser.getText({ pageJoiner: "" });
      return { text: result.text, pages: result.total };
    } finally {
      await parser.destroy();
    }
  }
  return { text: (await mammoth.extractRawText({ buffer: Buffer.from(doc.bytes) })).value, pages: null };
}

let docs: DemoDocument[];
beforeAll(async () => {
  docs = await generateDemoDocuments({ count: 60, seed: 11 });
}, 120_000);

describe("generateDemoDocuments", () => {
  it("gives the same documents, byte for byte, for the same seed, and others for another seed", SLOW, async () => {
    // Under another clock, so a timestamp that leaked into PDF or DOCX bytes would show.
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2031-07-04T12:00:00Z"));
    const again = await generateDemoDocuments({ count: 12, seed: 11 }).finally(() => vi.useRealTimers());
    expect(again.map((d) => d.kind)).toContain("docx");
    expect(again).toEqual(docs.slice(0, 12));
    const other = await generateDemoDocuments({ count: 12, seed: 12 });
    expect(other.map((d) => d.text)).not.toEqual(again.map((d) => d.text));
  });

  it("covers every cabinet type evenly and uses only the demo matters", () => {
    const perType = new Map<string, number>();
    for (const d of docs) perType.set(d.cabinetTypeName, (perType.get(d.cabinetTypeName) ?? 0) + 1);
    expect([...perType.keys()].sort()).toEqual([...TYPE_NAMES].sort());
    expect(new Set(perType.values())).toEqual(new Set([6]));
    for (const d of docs) expect(MATTER_NUMBERS).toContain(d.matterNumber);
  });

  it("mixes PDF and Word files whose bytes are what their kind and file name say", () => {
    const kinds = new Set(docs.map((d) => d.kind));
    expect(kinds).toEqual(new Set(["pdf", "docx"]));
    for (const d of docs) {
      expect(d.fileName.endsWith(`.${d.kind}`)).toBe(true);
      const head = Buffer.from(d.bytes).toString("latin1");
      if (d.kind === "pdf") {
        expect(head.startsWith("%PDF-")).toBe(true);
        expect(head.trimEnd().endsWith("%%EOF")).toBe(true);
      } else {
        expect(head.startsWith("PK\u0003\u0004")).toBe(true);
        expect(head).toContain("word/document.xml");
      }
    }
    expect(new Set(docs.map((d) => d.fileName)).size).toBe(docs.length);
  });

  it("puts into each file exactly the text it reports, PDFs on one to three pages", SLOW, async () => {
    const sample = [...docs.filter((d) => d.kind === "pdf").slice(0, 4), ...docs.filter((d) => d.kind === "docx").slice(0, 3)];
    for (const d of sample) {
      const { text, pages } = await readBack(d);
      expect(squash(text), d.fileName).toBe(squash(d.text));
      if (pages !== null) {
        expect(pages).toBeGreaterThanOrEqual(1);
        expect(pages).toBeLessThanOrEqual(3);
      }
    }
  });

  it("names the client in every document and sometimes the matter number, an e-mail or a tax ID ending", () => {
    const matters = listDemoMatters();
    let numbers = 0;
    let emails = 0;
    let taxIds = 0;
    for (const d of docs) {
      const m = matters.find((x) => x.number === d.matterNumber)!;
      const named = [m.clientName, ...m.aliases].some((n) => d.text.toLowerCase().includes(n.toLowerCase()));
      expect(named, d.fileName).toBe(true);
      if (d.text.toUpperCase().includes(m.number)) numbers++;
      if (m.emailDomains.some((dom) => d.text.includes(`@${dom}`))) emails++;
      if (m.taxIdLast4 && new RegExp(`(?:xx-xxx|XX-XXX|ending (?:in )?|\\.\\.\\.)${m.taxIdLast4}`).test(d.text)) taxIds++;
    }
    for (const n of [numbers, emails, taxIds]) {
      expect(n).toBeGreaterThan(0);
      expect(n).toBeLessThan(docs.length);
    }
  });

  it("uses only reserved example domains for e-mail addresses", () => {
    const domains = docs.flatMap((d) => [...d.text.matchAll(/@([a-z0-9.-]+)/gi)].map((m) => m[1].toLowerCase()));
    expect(domains.length).toBeGreaterThan(0);
    for (const domain of domains) expect(domain).toMatch(/(^|\.)example(\.com)?$/);
  });

  it("writes a plain memo from the description and keywords for a type it has no templates for", SLOW, async () => {
    const type = { name: "Insurance policies", description: "Policies, endorsements and renewal notices from insurers.", keywords: ["policy number", "premium", "insured"] };
    const [doc] = await generateDemoDocuments({ count: 1, seed: 3, types: [type] });
    expect(doc.cabinetTypeName).toBe("Insurance policies");
    expect(doc.text).toContain("Policies, endorsements and renewal notices from insurers.");
  });

  it("refuses a bad count and an empty type or matter list with a sentence", async () => {
    await expect(generateDemoDocuments({ count: -1, seed: 1 })).rejects.toThrow(/count must be a whole number/);
    await expect(generateDemoDocuments({ count: 2, seed: 1, types: [] })).rejects.toThrow(/at least one cabinet type and one matter/);
    await expect(generateDemoDocuments({ count: 2, seed: 1, matters: [] })).rejects.toThrow(/at least one cabinet type and one matter/);
    expect(await generateDemoDocuments({ count: 0, seed: 1 })).toEqual([]);
  });
});
