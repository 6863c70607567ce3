// Debian's chromium driven by playwright-core. Flags: the machine notes for this workplace
// (no sandbox as root, no GPU, no background networking on a closed network). Playwright gives
// each launch a fresh, empty profile directory of its own.
import fs from "node:fs";
import { chromium, type Browser, type Page } from "playwright-core";
import { BASE_URL, DEMO_PASSWORD } from "./http";

export async function launchBrowser(): Promise<Browser> {
  const executablePath = ["/usr/bin/chromium", "/usr/bin/chromium-browser"].find((p) => fs.existsSync(p));
  if (!executablePath) throw new Error("Chromium is not installed. Run `apt-get install -y chromium` (npm test does this when run as root).");
  return chromium.launch({
    executablePath,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

/** Signs a demo account in through the sign-in form and waits until it has left it. */
export async function signIn(page: Page, email: string) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
}
