// Debian's chromium driven by playwright-core. Flags: the machine notes for this workplace
// (no sandbox as root, no GPU, no background networking on a closed network). Playwright gives
// each launch a fresh, empty profile directory of its own.
import fs from "node:fs";
import { chromium, type Browser } from "playwright-core";

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
