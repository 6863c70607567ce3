import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signIn } from "./browser";
import { BASE_URL } from "./http";
import { ownerDb } from "../helpers/db";
import { insertQueueDocument } from "../helpers/queue-documents";

// To review on many generated documents: paging with the total in words, search by name,
// sort and filters in the address (a reload and a visit from the rail keep them), the newest
// upload in one step, and a count per cabinet type that stays true after a decision.
const owner = ownerDb();
let browser: Browser;
const run = crypto.randomBytes(3).toString("hex");
const marker = `q${run}`;
const ids: number[] = [];

beforeAll(async () => {
  // 130 invoices and 3 payroll records, the last uploaded a minute after the rest.
  for (let i = 0; i < 133; i++) {
    const payroll = i >= 130;
    ids.push(await insertQueueDocument(owner, { name: `${marker}-${payroll ? "payroll" : "invoice"}-${String(i).padStart(3, "0")}.pdf`, ranked: payroll ? ["Payroll records", "Invoices & receipts"] : ["Invoices & receipts", "Payroll records"], candidates: ["AQ-2026-0101"] }));
  }
  await owner("documents").where({ id: ids.at(-1)! }).update({ uploaded_at: new Date(Date.now() + 60_000) });
  browser = await launchBrowser();
}, 300_000);
afterAll(async () => {
  await browser?.close();
  await owner.destroy();
});

describe("To review, a queue you can finish", () => {
  it("pages, searches, keeps its query in the address and in memory, and counts per cabinet type", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, "clerk@example.com");
    await page.goto(`${BASE_URL}/review`);
    await page.getByTestId("queue-search").fill(marker);
    await page.waitForURL((u) => u.searchParams.get("q") === marker);
    const total = page.getByTestId("queue-total").first();
    await expect.poll(() => total.textContent()).toBe("1–100 of 133 waiting");
    expect(await page.getByTestId("queue-row").count()).toBe(100);
    const counts = async () => Object.fromEntries((await page.getByTestId("type-count").allTextContents()).map((t) => [t.replace(/\s*\d+$/, ""), Number(t.match(/(\d+)$/)![1])]));
    expect(await counts()).toEqual({ "Invoices & receipts": 130, "Payroll records": 3 });

    await page.getByTestId("next-page").first().click();
    await expect.poll(() => total.textContent()).toBe("101–133 of 133 waiting");
    expect(await page.getByTestId("queue-row").count()).toBe(33);

    // The newest upload in one step.
    await page.getByTestId("newest-first").click();
    await expect.poll(() => page.getByTestId("queue-row").first().getAttribute("data-id")).toBe(String(ids.at(-1)));
    expect(new URL(page.url()).searchParams.get("dir")).toBe("desc");

    // A reload keeps the query; so does coming back from the rail to a bare /review.
    await page.reload();
    await expect.poll(() => page.getByTestId("queue-row").first().getAttribute("data-id")).toBe(String(ids.at(-1)));
    expect(await page.getByTestId("queue-search").inputValue()).toBe(marker);
    await page.goto(`${BASE_URL}/cabinets`);
    await page.getByRole("link", { name: "To review" }).click();
    await page.waitForURL((u) => u.pathname === "/review");
    await expect.poll(() => page.getByTestId("queue-row").first().getAttribute("data-id")).toBe(String(ids.at(-1)));
    expect(await page.getByTestId("queue-search").inputValue()).toBe(marker);

    // A per-type count filters; a decision lowers the counts at once, and they stay true.
    await page.locator('[data-testid="type-count"]', { hasText: "Payroll records" }).click();
    await expect.poll(() => total.textContent()).toBe("3 of 3 waiting");
    await page.getByTestId("queue-row").first().click();
    await page.getByTestId("accept-button").waitFor();
    await expect.poll(() => page.getByTestId("accept-button").isEnabled()).toBe(true);
    await page.keyboard.press("a");
    await expect.poll(() => total.textContent()).toBe("2 of 2 waiting");
    await expect.poll(counts).toEqual({ "Invoices & receipts": 130, "Payroll records": 2 });
    await expect.poll(async () => (await owner("documents").where({ id: ids.at(-1)! }).first("filed_how")).filed_how).toBe("accepted");
    await page.reload();
    await expect.poll(counts).toEqual({ "Invoices & receipts": 130, "Payroll records": 2 });
    await context.close();
  });
});
