import fs from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { headObject } from "@/storage/s3";
import { launchBrowser } from "./browser";
import { BASE_URL, DEMO_PASSWORD } from "./http";
import { ownerDb } from "../helpers/db";
import { insertStoredFiledDocument, yearsAgo, type StoredDoc } from "../helpers/records";

// Records in a browser: a partner places a hold on a matter and lifts it; an admin proposes a
// past-due batch; the partner (a second person, on the matter) approves it; the originals are
// gone from the bucket and the certificate of disposal downloads as a PDF.
const owner = ownerDb();
let browser: Browser;
let docs: StoredDoc[];
let matterId: number;

async function signedInPage(email: string): Promise<Page> {
  const context = await browser.newContext({ acceptDownloads: true });
  const page = await context.newPage();
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  return page;
}

const openDialog = (page: Page) => page.locator("dialog[open]");

beforeAll(async () => {
  docs = [];
  for (const label of ["walk-invoice-1", "walk-invoice-2"]) docs.push(await insertStoredFiledDocument(owner, { matterNumber: "AQ-2026-0101", typeName: "Invoices & receipts", filedAt: yearsAgo(9), label }));
  matterId = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await owner.destroy();
});

describe("holds and disposal in a browser", () => {
  it("a partner places a hold on a matter, sees it on the document, and lifts it", async () => {
    const page = await signedInPage("partner@example.com");
    await page.goto(`${BASE_URL}/holds`);
    await page.getByText("Retention periods are defaults").first().waitFor();
    await page.getByTestId("hold-matter").selectOption(String(matterId));
    await page.getByTestId("hold-reason").fill("Lender's review of the 2016–2019 accounts");
    await page.getByTestId("hold-reference").fill("REQ-2026-031");
    await page.getByTestId("place-hold").click();
    const row = page.getByTestId("hold-row").filter({ hasText: "REQ-2026-031" });
    await row.waitFor();
    expect(await row.textContent()).toContain("Legal hold in force");

    await page.goto(`${BASE_URL}/documents/${docs[0].id}`);
    expect(await page.getByTestId("hold-banner").textContent()).toContain("REQ-2026-031");
    await page.goto(`${BASE_URL}/disposal`);
    expect(await page.getByTestId("due-row").filter({ hasText: docs[0].name }).count()).toBe(0); // held: not due

    await page.goto(`${BASE_URL}/holds`);
    await page.getByTestId("hold-row").filter({ hasText: "REQ-2026-031" }).getByTestId("lift-hold").click();
    await openDialog(page).getByTestId("lift-hold-reason").fill("The lender's review is finished");
    await openDialog(page).getByTestId("confirm").click();
    await expect.poll(() => page.getByTestId("hold-row").filter({ hasText: "REQ-2026-031" }).count(), { timeout: 15_000 }).toBe(0);
    const events = await owner("hold_events as e").join("legal_holds as h", "h.id", "e.hold_id").where("h.reference", "REQ-2026-031").pluck("e.action");
    expect(events).toEqual(["placed", "released"]);
    await page.context().close();
  });

  it("an admin proposes a batch, the partner approves it, and the certificate downloads", async () => {
    const admin = await signedInPage("admin@example.com");
    await admin.goto(`${BASE_URL}/disposal`);
    for (const d of docs) await admin.getByTestId(`pick-${d.id}`).check();
    await admin.getByTestId("batch-note").fill("Bakery invoices past seven years");
    await admin.getByTestId("propose").click();
    expect(await openDialog(admin).textContent()).toContain("Confirm them against your jurisdiction's rules");
    await openDialog(admin).getByTestId("confirm").click();
    await admin.waitForURL(/\/disposal\/batches\/\d+$/);
    const batchUrl = admin.url();
    expect(await admin.getByTestId("why-not-approver").textContent()).toContain("You proposed this batch");
    await admin.context().close();

    const partner = await signedInPage("partner@example.com");
    await partner.goto(batchUrl);
    await partner.getByTestId("approve-batch").click();
    await openDialog(partner).getByTestId("confirm").click();
    await expect.poll(() => partner.getByTestId("batch-status").textContent(), { timeout: 30_000 }).toBe("Approved and carried out");
    for (const d of docs) expect(await headObject(d.key)).toBeNull();

    const [download] = await Promise.all([partner.waitForEvent("download"), partner.getByTestId("certificate-pdf").click()]);
    const file = await download.path();
    expect(fs.readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");
    expect(download.suggestedFilename()).toMatch(/^foldwright-certificate-of-disposal-\d+\.pdf$/);

    await partner.goto(`${BASE_URL}/documents/${docs[0].id}`);
    expect(await partner.getByTestId("tombstone").textContent()).toContain("Only this record remains");
    await partner.context().close();
  });
});
