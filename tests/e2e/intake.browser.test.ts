import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser } from "./browser";
import { BASE_URL, DEMO_PASSWORD } from "./http";
import { makeDocx, makeTextPdf, renderTextPng } from "../helpers/make-files";

// A clerk drops three files at Intake — a text PDF, a Word file and a scanned image — and
// watches each reach Ready in the browser.
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("Intake in a browser", () => {
  it("drops a PDF, a DOCX and a scan and sees each reach Ready", async () => {
    const stamp = Date.now();
    const files = [
      { name: `retainer-${stamp}.pdf`, mimeType: "application/pdf", buffer: Buffer.from(await makeTextPdf([[`Retainer agreement ${stamp}`]])) },
      { name: `minutes-${stamp}.docx`, mimeType: "application/vnd.openxmlformats-officedocument.wordprocessingml.document", buffer: Buffer.from(await makeDocx([`Minutes of the board ${stamp}`])) },
      { name: `scan-${stamp}.png`, mimeType: "image/png", buffer: Buffer.from(await renderTextPng(["Notice of deficiency", `Ref ${stamp}`])) },
    ];
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("clerk@example.com");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/intake$/);
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Intake");

    await page.getByTestId("intake-input").setInputFiles(files);
    for (const f of files) {
      const row = page.locator(`[data-testid="intake-row"][data-name="${f.name}"]`);
      await row.locator('[data-state="ready"]').waitFor({ timeout: 90_000 });
      expect(await row.locator("[data-state]").textContent()).toBe("Ready");
    }
    // The recent-uploads table lists them too, with the scan marked as read by OCR.
    await expect.poll(() => page.getByRole("region", { name: "Your recent uploads" }).textContent(), { timeout: 20_000 }).toContain(files[2].name);
    await context.close();
  });
});
