import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser } from "./browser";
import { BASE_URL, DEMO_PASSWORD } from "./http";
import { linkIn, waitForMail } from "../helpers/mail";

// An admin invites a person in Setup › People; the person opens the e-mailed link (read from the
// real catcher), chooses a password and signs in with it.
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("inviting a person in a browser", () => {
  it("the admin invites, the person accepts and signs in", async () => {
    const email = `browser-invitee-${Date.now()}@example.com`;
    const adminContext = await browser.newContext();
    const admin = await adminContext.newPage();
    await admin.goto(`${BASE_URL}/sign-in`);
    await admin.getByLabel("E-mail").fill("admin@example.com");
    await admin.getByLabel("Password").fill(DEMO_PASSWORD);
    await admin.getByRole("button", { name: "Sign in" }).click();
    await admin.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    await admin.goto(`${BASE_URL}/setup/people`);
    await admin.getByTestId("invite-name").fill("Idris Vantongeren");
    await admin.getByTestId("invite-email").fill(email);
    await admin.getByTestId("invite-role").selectOption("partner");
    await admin.getByTestId("invite-submit").click();
    await admin.getByText(`Invitation sent to ${email}`).waitFor();
    const row = admin.locator(`[data-testid="person-row"][data-email="${email}"]`);
    expect(await row.getByTestId("person-state").textContent()).toMatch(/^Invited/);

    const { url } = linkIn(await waitForMail(email, { subject: "invited" }), "invite");
    const personContext = await browser.newContext();
    const person = await personContext.newPage();
    await person.goto(url);
    await person.getByTestId("new-password").fill("password1234");
    await person.getByTestId("new-password-again").fill("password1234");
    await person.getByTestId("set-password").click();
    await person.getByText(/commonly used passwords/).waitFor(); // the rule's sentence, and the link still works
    const chosen = "tidewater ledger pencils";
    await person.getByTestId("new-password").fill(chosen);
    await person.getByTestId("new-password-again").fill(chosen);
    await person.getByTestId("set-password").click();
    await person.getByTestId("go-sign-in").click();
    await person.waitForURL(/\/sign-in/);
    await person.getByLabel("E-mail").fill(email);
    await person.getByLabel("Password").fill(chosen);
    await person.getByRole("button", { name: "Sign in" }).click();
    await person.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
    expect(await person.getByTestId("current-role").textContent()).toBe("Partner");

    await admin.reload();
    expect(await admin.locator(`[data-testid="person-row"][data-email="${email}"]`).getByTestId("person-state").textContent()).toBe("Active");
    await adminContext.close();
    await personContext.close();
  });
});
