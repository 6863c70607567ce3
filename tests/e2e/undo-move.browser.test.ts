import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signIn } from "./browser";
import { BASE_URL } from "./http";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertUnfiledDocument, typeIds } from "../helpers/filed-documents";
import { fileDocument } from "@/lib/data/filing";
import { saveSuggestion } from "@/lib/data/suggestions";
import { putObject } from "@/storage/s3";
import { makeTextPdf } from "../helpers/make-files";

// Undo in To review puts the document back in the queue and writes a reversing event; Move on
// the document page asks for a reason, offers only matters the person may see, and can be undone.
const owner = ownerDb();
let browser: Browser;
let types: Map<string, number>;
let matterId: number;
let otherMatter: { id: number; number: string };
const SHOTS = "/tmp/foldwright-ux-record"; // screenshots looked at by hand, not compared

beforeAll(async () => {
  types = await typeIds(owner);
  matterId = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
  otherMatter = await owner("matters").where({ restricted: false }).whereNot({ id: matterId }).orderBy("number").first("id", "number");
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await owner.destroy();
});

describe("undo and move in a browser", () => {
  it("Undo after an accept brings the document back to the queue and writes an 'undone' event", async () => {
    const id = await insertUnfiledDocument(owner, "Invoices & receipts", "Invoice for matter AQ-2026-0101.");
    // The oldest upload of the queue, so it is the first row under the default sort (oldest first).
    await owner("documents").where({ id }).update({ uploaded_at: new Date("2001-01-01T00:00:00Z") });
    const typeId = types.get("Invoices & receipts")!;
    await saveSuggestion(null, null, {
      documentId: id, modelVersionId: null, method: "cold_start",
      ranked: [{ cabinetTypeId: typeId, confidence: 0.9, probability: null, source: "description" }, { cabinetTypeId: types.get("Correspondence")!, confidence: 0.1, probability: null, source: "description" }],
      noConfidentMatch: false, modelConfidence: null, why: [],
      matterCandidates: [{ matterId, score: 0.9, reasons: ["matter number in the text"] }],
      topMatterId: matterId, matterAmbiguous: false, autoFile: false,
    });
    const name = (await owner("documents").where({ id }).first("original_name")).original_name as string;

    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, "clerk@example.com");
    await page.goto(`${BASE_URL}/review`);
    const row = page.locator(`[data-testid="queue-row"][data-id="${id}"]`);
    await row.waitFor({ timeout: 30_000 });
    await row.click();
    const panel = page.getByTestId("decision-panel");
    await expect.poll(() => panel.locator("h2").textContent()).toBe(name);
    await expect.poll(() => panel.getByTestId("accept-button").isEnabled()).toBe(true);
    await page.keyboard.press("a");
    await row.waitFor({ state: "detached", timeout: 15_000 });
    const notice = page.getByTestId("decision-notice");
    await notice.getByText(`Accepted: ${name} → Invoices & receipts, AQ-2026-0101.`).waitFor({ timeout: 15_000 });
    await page.screenshot({ path: `${SHOTS}-review-undo.png` });
    const accepted = await owner("filing_events").where({ document_id: id, action: "accepted" }).first("id");
    expect(accepted).toBeTruthy();

    await page.keyboard.press("u"); // the Undo key while the button shows
    await notice.getByText(`Undone: ${name} is back in To review.`).waitFor({ timeout: 15_000 });
    await row.waitFor({ timeout: 15_000 }); // back in the list
    const last = await owner("filing_events").where({ document_id: id }).orderBy("id", "desc").first();
    expect(last).toMatchObject({ action: "undone", reverses_event_id: accepted.id, from_matter_id: matterId, to_matter_id: null });
    expect(await owner("documents").where({ id }).first("filed_at", "matter_id", "cabinet_type_id")).toEqual({ filed_at: null, matter_id: null, cabinet_type_id: null });
    await context.close();
  });

  it("Move from the document page: a reason is needed, walled matters are not offered, and Undo puts it back", async () => {
    const clerk = await demoUser("clerk@example.com");
    const id = await insertUnfiledDocument(owner, "Contracts & leases");
    await fileDocument(clerk, id, { action: "file", cabinetTypeId: types.get("Contracts & leases"), matterId });
    const name = (await owner("documents").where({ id }).first("original_name")).original_name as string;
    const restricted = (await owner("matters").where({ restricted: true }).first("number")).number as string;

    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, "clerk@example.com");
    await page.goto(`${BASE_URL}/documents/${id}`);
    expect(await page.title()).toContain(name);
    await page.getByTestId("breadcrumb").getByRole("link", { name: "AQ-2026-0101" }).waitFor();
    await page.getByTestId("move-button").click();
    const dialog = page.getByTestId("move-dialog");
    await dialog.waitFor();
    const options = await dialog.locator("#move-matter option").allTextContents();
    expect(options.some((o) => o.startsWith(otherMatter.number))).toBe(true);
    expect(options.some((o) => o.includes(restricted))).toBe(false); // the clerk is outside its wall
    await dialog.locator("#move-matter").selectOption(String(otherMatter.id));
    await dialog.getByTestId("move-submit").click();
    await dialog.getByRole("alert").getByText("Say why it moves").waitFor(); // no reason yet: nothing sent
    expect(await owner("filing_events").where({ document_id: id, action: "moved" }).first("id")).toBeUndefined();
    await dialog.getByRole("button", { name: "wrong matter" }).click();
    await page.screenshot({ path: `${SHOTS}-move-dialog.png` });
    await dialog.getByTestId("move-submit").click();
    const notice = page.getByTestId("decision-notice");
    await notice.getByText(`Moved: ${name} → Contracts & leases, ${otherMatter.number}.`).waitFor({ timeout: 15_000 });
    await page.getByTestId("document-filed").getByText(otherMatter.number).waitFor({ timeout: 15_000 });
    const moved = await owner("filing_events").where({ document_id: id, action: "moved" }).first();
    expect(moved).toMatchObject({ user_id: clerk.id, reason: "wrong matter", from_matter_id: matterId, to_matter_id: otherMatter.id });
    await page.screenshot({ path: `${SHOTS}-document-moved.png`, fullPage: true });

    await notice.getByTestId("undo-button").click();
    await notice.getByText(`Undone: ${name} is back in Contracts & leases of AQ-2026-0101.`).waitFor({ timeout: 15_000 });
    expect((await owner("documents").where({ id }).first("matter_id")).matter_id).toBe(matterId);
    expect(await owner("filing_events").where({ reverses_event_id: moved.id }).first("action")).toEqual({ action: "undone" });

    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await page.getByTestId("move-button").waitFor();
    await page.screenshot({ path: `${SHOTS}-document-390.png`, fullPage: true });
    await context.close();
  });

  it("the document page shows the original's page beside the text read, and pages through with the keyboard", async () => {
    const bytes = await makeTextPdf([["Lease agreement, page one"], ["Schedule of rent, page two"]]);
    const key = `test/preview/${Date.now()}`;
    await putObject(key, Buffer.from(bytes), { contentType: "application/pdf" });
    const id = await insertUnfiledDocument(owner, "Contracts & leases");
    await owner("documents").where({ id }).update({ storage_key: key, media_type: "application/pdf", size_bytes: bytes.byteLength, page_count: 2 });
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, "clerk@example.com");
    await page.goto(`${BASE_URL}/documents/${id}`);
    const preview = page.getByTestId("page-preview");
    await preview.getByTestId("preview-image").waitFor({ timeout: 30_000 });
    await expect.poll(() => preview.getByTestId("preview-page").textContent()).toBe("Page 1 of 2");
    await preview.getByTestId("preview-frame").focus();
    await page.keyboard.press("ArrowRight");
    await expect.poll(() => preview.getByTestId("preview-image").getAttribute("alt")).toContain("Page 2 of");
    await page.screenshot({ path: `${SHOTS}-document-preview.png` });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: `${SHOTS}-document-preview-390.png`, fullPage: true });
    await context.close();
  });
});
