import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser } from "./browser";
import { BASE_URL, DEMO_PASSWORD } from "./http";

// Each demo role signs in through the real form in Chromium and sees its own navigation
// (DESIGN.md §2 and §3 are the source of the expected areas).
const NAV = {
  clerk: ["Intake", "To review", "Cabinets", "Holds"],
  partner: ["To review", "Cabinets", "Holds", "Disposal"],
  admin: ["Intake", "To review", "Cabinets", "Holds", "Disposal", "History", "Models", "Setup"],
  auditor: ["Cabinets", "Holds", "Disposal", "History", "Models"],
} as const;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("signing in with a browser", () => {
  for (const role of Object.keys(NAV) as (keyof typeof NAV)[]) {
    it(`${role} signs in, sees the ${role} navigation, and signs out`, async () => {
      const context = await browser.newContext();
      const page = await context.newPage();
      await page.goto(`${BASE_URL}/`);
      await page.waitForURL(/\/sign-in/);
      await page.getByLabel("E-mail").fill(`${role}@example.com`);
      await page.getByLabel("Password").fill(DEMO_PASSWORD);
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
      const links = await page.getByRole("navigation", { name: "Areas" }).getByRole("link").allTextContents();
      expect(links).toEqual(NAV[role]);
      expect(await page.getByTestId("current-role").textContent()).toBe(role[0].toUpperCase() + role.slice(1));
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL(/\/sign-in/);
      await page.goto(`${BASE_URL}/cabinets`);
      await page.waitForURL(/\/sign-in\?next=%2Fcabinets/);
      await context.close();
    });
  }

  it("shows a wrong password on the form without signing in", async () => {
    const page = await browser.newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("clerk@example.com");
    await page.getByLabel("Password").fill("not-it");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByRole("alert").filter({ hasText: "Not signed in" }).textContent()).toMatch(/do not match an account/);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.close();
  });

  it("shows a plain not-allowed page to a wrong role", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("partner@example.com");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    const res = await page.goto(`${BASE_URL}/setup`);
    expect(res?.status()).toBe(403);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe("Not allowed");
    await context.close();
  });
});
