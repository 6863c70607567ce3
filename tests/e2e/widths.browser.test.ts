import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signIn } from "./browser";
import { BASE_URL } from "./http";
import { listRoutesAndPages } from "./app-files";
import { ownerDb } from "../helpers/db";
import { insertQueueDocument } from "../helpers/queue-documents";

// Every page at a phone's width (390 px, an iPhone 12–15 viewport) and a small laptop's
// (1024 × 768): nothing scrolls sideways (document.documentElement.scrollWidth equals the
// viewport width), and axe-core (Deque's engine, its rule `color-contrast` = WCAG 2.1 SC 1.4.3,
// 4.5:1 for normal text) reports no contrast violation. The pages are walked from app/, so a
// new page is checked without being listed here.
const require = createRequire(import.meta.url);
const AXE = require.resolve("axe-core/axe.min.js");
const owner = ownerDb();
let browser: Browser;
let documentId = 0;
let batchId: number | null = null;

/** The address of a page file under app/ ("(app)/documents/[id]/page.tsx" → "/documents/12"). */
function addressOf(file: string): string | null {
  const parts = file.replace(/\/?page\.tsx$/, "").split("/").filter((p) => p && !/^\(.*\)$/.test(p));
  const out: string[] = [];
  for (const p of parts) {
    if (p === "[id]") {
      const id = parts.includes("batches") ? batchId : documentId;
      if (!id) return null;
      out.push(String(id));
    } else if (p === "[token]") out.push("no-such-token");
    else out.push(p);
  }
  return `/${out.join("/")}`;
}

const SIGNED_OUT = new Set(["(auth)"]);
const pages = listRoutesAndPages().filter((f) => f.endsWith("page.tsx"));

beforeAll(async () => {
  documentId = await insertQueueDocument(owner, { name: "widths-check-a-rather-long-file-name-without-spaces_2026-12-02_scan_0001.pdf", ranked: ["Invoices & receipts", "Payroll records"], candidates: ["AQ-2026-0101"] });
  batchId = (await owner("disposal_batches").orderBy("id").first("id"))?.id ?? null;
  if (!batchId) {
    // An empty proposed batch is enough to open its page.
    const admin = await owner("users").where({ email: "admin@example.com" }).first("id");
    [batchId] = await owner("disposal_batches").insert({ note: "Widths check", proposed_by: admin.id });
  }
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await owner.destroy();
});

describe.each([
  { width: 390, height: 844 },
  { width: 1024, height: 768 },
])("every page at $width px", ({ width, height }) => {
  it("has no sideways scroll and no contrast violation", async () => {
    const failures: string[] = [];
    const checked: string[] = [];
    for (const signedOut of [true, false]) {
      const context = await browser.newContext({ viewport: { width, height } });
      const page = await context.newPage();
      if (!signedOut) await signIn(page, "admin@example.com");
      for (const file of pages) {
        if (SIGNED_OUT.has(file.split("/")[0]) !== signedOut) continue;
        const path = addressOf(file);
        if (!path) {
          failures.push(`${file}: no record to open it with`);
          continue;
        }
        await page.goto(`${BASE_URL}${path}`);
        await page.waitForLoadState("networkidle");
        const { scrollWidth, innerWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
        if (scrollWidth !== innerWidth) failures.push(`${path}: scrollWidth ${scrollWidth} ≠ ${innerWidth}`);
        await page.addScriptTag({ path: AXE });
        const violations = await page.evaluate(async () => {
          const axe = (window as unknown as { axe: { run: (c: Document, o: unknown) => Promise<{ violations: { id: string; nodes: { target: string[]; failureSummary: string }[] }[] }> } }).axe;
          const r = await axe.run(document, { runOnly: { type: "rule", values: ["color-contrast"] } });
          return r.violations.flatMap((v) => v.nodes.map((n) => `${n.target.join(" ")} — ${n.failureSummary.replace(/\s+/g, " ").slice(0, 160)}`));
        });
        for (const v of violations) failures.push(`${path}: contrast ${v}`);
        checked.push(path);
      }
      await context.close();
    }
    expect(failures).toEqual([]);
    expect(checked.length).toBe(pages.length);
  });
});
