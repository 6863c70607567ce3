import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signIn } from "./browser";
import { BASE_URL, Client } from "./http";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";
import { insertFiledDocuments } from "../helpers/filed-documents";
import { waitUntil as pollUntil } from "../helpers/wait";

// The whole loop in a browser: a model is trained through the API from human filings; a clerk
// uploads two generated PDFs, sees them reach To review with a suggestion and runner-ups,
// accepts one with the keyboard and refiles the other to a runner-up; the filing record holds
// the right from → to, user and model version.
const owner = ownerDb();
let browser: Browser;
let versionId: number;

const waitFor = <T,>(what: string, probe: () => Promise<T | undefined | false | null>, ms = 120_000) => pollUntil(what, probe, ms, 500);

async function trainThroughApi(): Promise<number> {
  const admin = await Client.signedIn("admin@example.com");
  const models = async () => (await (await admin.request("GET", "/api/models")).json()) as { training: unknown; current: number | null; versions: { id: number; status: string; reason: string | null }[] };
  await waitFor("an earlier run to end", async () => !(await models()).training);
  const res = await admin.request("POST", "/api/models/retrain");
  expect(res.status).toBe(202);
  const { versionId: id } = await res.json();
  // "candidate" is the moment between storing the model and promoting it: wait past it too.
  const v = await waitFor("the new version to finish", async () => (await models()).versions.find((x) => x.id === id && !["training", "candidate"].includes(x.status)));
  expect(v).toMatchObject({ status: "current" });
  return id;
}

beforeAll(async () => {
  await insertFiledDocuments(owner, 15);
  versionId = await trainThroughApi();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await owner.destroy();
});

describe("the filing loop in a browser", () => {
  it("upload → To review with runner-ups → accept with A → refile with 2 → on the record", async () => {
    const stamp = Date.now();
    const invoiceText = ["Invoice", "Amount due and subtotal, remit payment, net 30", "Line item, tax rate, receipt", "Matter AQ-2026-0101", `Ref ${stamp}`];
    const files = [
      { name: `invoice-a-${stamp}.pdf`, mimeType: "application/pdf", buffer: Buffer.from(await makeTextPdf([invoiceText])) },
      { name: `invoice-b-${stamp}.pdf`, mimeType: "application/pdf", buffer: Buffer.from(await makeTextPdf([[...invoiceText, "second copy"]])) },
    ];
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, "clerk@example.com");
    await page.goto(`${BASE_URL}/intake`);
    await page.getByTestId("intake-input").setInputFiles(files);
    for (const f of files) await page.locator(`[data-testid="intake-row"][data-name="${f.name}"] [data-state="ready"]`).waitFor({ timeout: 90_000 });
    const ids = await Promise.all(files.map(async (f) => (await owner("documents").where({ original_name: f.name }).first("id")).id as number));
    await waitFor("both suggestions", async () => (await owner("suggestions").whereIn("document_id", ids).count({ n: "*" }))[0].n === 2);

    await page.goto(`${BASE_URL}/review?q=${stamp}`); // the queue may hold more than a page: search finds these two
    const rowA = page.locator(`[data-testid="queue-row"][data-id="${ids[0]}"]`);
    await rowA.waitFor({ timeout: 30_000 });
    await rowA.click();
    const panel = page.getByTestId("decision-panel");
    await expect.poll(() => panel.locator("h2").textContent()).toBe(files[0].name);
    await panel.getByTestId("top-suggestion").waitFor();
    expect(await panel.getByTestId("runner-up").count()).toBeGreaterThanOrEqual(2);
    expect(await panel.getByTestId("top-suggestion").textContent()).toContain("Invoices & receipts");
    await expect.poll(() => panel.getByTestId("accept-button").isEnabled()).toBe(true);
    await page.keyboard.press("a");
    await rowA.waitFor({ state: "detached", timeout: 15_000 }); // at once (optimistic) …
    await page.getByText(`Accepted: ${files[0].name} → Invoices & receipts`).waitFor({ timeout: 15_000 }); // … and confirmed

    const rowB = page.locator(`[data-testid="queue-row"][data-id="${ids[1]}"]`);
    await rowB.click();
    await expect.poll(() => panel.locator("h2").textContent()).toBe(files[1].name);
    const runnerUp = ((await panel.getByTestId("runner-up").first().textContent()) ?? "").replace(/^2/, "").replace(/\(by description\)/, "").replace(/\d+%$/, "").trim();
    await expect.poll(() => panel.getByTestId("accept-button").isEnabled()).toBe(true);
    await page.keyboard.press("2");
    await rowB.waitFor({ state: "detached", timeout: 15_000 });
    await page.getByText(`Refiled: ${files[1].name} → ${runnerUp}`).waitFor({ timeout: 15_000 });
    await context.close();

    const types = new Map((await owner("cabinet_types").select("id", "name")).map((t) => [t.id, t.name]));
    const clerk = await owner("users").where({ email: "clerk@example.com" }).first("id");
    const events = await owner("filing_events").whereIn("document_id", ids).whereNot({ action: "suggested" }).orderBy("id");
    expect(events.map((e) => ({ doc: e.document_id, action: e.action, user: e.user_id, version: e.model_version_id, from: types.get(e.from_cabinet_type_id), to: types.get(e.to_cabinet_type_id) }))).toEqual([
      { doc: ids[0], action: "accepted", user: clerk.id, version: versionId, from: "Invoices & receipts", to: "Invoices & receipts" },
      { doc: ids[1], action: "refiled", user: clerk.id, version: versionId, from: "Invoices & receipts", to: runnerUp },
    ]);
    const suggested = await owner("filing_events").whereIn("document_id", ids).where({ action: "suggested" });
    expect(suggested.map((e) => e.model_version_id)).toEqual([versionId, versionId]);
  });
});
