import { it } from "vitest";
import { launchBrowser } from "./browser";
import { BASE_URL, DEMO_PASSWORD, Client } from "./http";
import { linkIn, waitForMail } from "../helpers/mail";
it("shots", async () => {
  const admin = await Client.signedIn("admin@example.com");
  const email = `shot-${Date.now()}@example.com`;
  await admin.request("POST", "/api/users", { email, name: "Shot Person", role: "clerk" });
  const { url } = linkIn(await waitForMail(email, { subject: "invited" }), "invite");
  const b = await launchBrowser();
  for (const w of [1280, 420]) {
    const ctx = await b.newContext({ viewport: { width: w, height: 900 } });
    const p = await ctx.newPage();
    await p.goto(url); await p.screenshot({ path: `/tmp/shot-invite-${w}.png`, fullPage: true });
    await p.goto(`${BASE_URL}/forgot-password`); await p.screenshot({ path: `/tmp/shot-forgot-${w}.png` });
    await p.goto(`${BASE_URL}/sign-in`);
    await p.getByLabel("E-mail").fill("admin@example.com");
    await p.getByLabel("Password").fill(DEMO_PASSWORD);
    await p.getByRole("button", { name: "Sign in" }).click();
    await p.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    for (const path of ["setup/people", "setup/senders", "setup/outbox", "profile"]) {
      await p.goto(`${BASE_URL}/${path}`);
      await p.screenshot({ path: `/tmp/shot-${path.replace("/", "-")}-${w}.png`, fullPage: true });
    }
    await ctx.close();
  }
  await b.close();
});
