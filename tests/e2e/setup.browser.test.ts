import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, signIn } from "./browser";
import { BASE_URL, Client } from "./http";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";
import { waitUntil as pollUntil } from "../helpers/wait";

// An office set up from the screens alone: the admin adds a cabinet type, a client and a
// restricted matter with a team (the clerk on it); the clerk then uploads a document and files it
// into the new type and matter from To review. Every step is then on the setup record.
const owner = ownerDb();
let browser: Browser;
const stamp = `${Date.now()}`;
const typeName = `Vessel surveys ${stamp}`;
const clientName = `Heron Boatworks ${stamp}`;
const matterNumber = `HB-${stamp}`;

const waitFor = <T,>(what: string, probe: () => Promise<T | undefined | false | null>, ms = 120_000) => pollUntil(what, probe, ms, 500);

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  // The record is append-only: the test's type is retired, not removed, so later tests' pickers stay as they were.
  const type = await owner("cabinet_types").where({ name: typeName }).first("id");
  if (type) await (await Client.signedIn("admin@example.com")).request("PATCH", `/api/cabinet-types/${type.id}`, { active: false });
  await owner.destroy();
});

describe("Setup in a browser", () => {
  it("admin adds a type, a client and a restricted matter with a team; a clerk files a document into them", async () => {
    const admin = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await admin.newPage();
    await signIn(page, "admin@example.com");

    await page.goto(`${BASE_URL}/setup`);
    await page.getByRole("link", { name: /Cabinet types/ }).click();
    await page.getByTestId("add-cabinet-type").click();
    const typeForm = page.getByTestId("cabinet-type-form");
    await typeForm.waitFor();
    // Validated as you type: clearing the years says what to do before anything is sent.
    await typeForm.getByLabel("Years", { exact: true }).fill("");
    await expect.poll(() => page.getByTestId("error-ct-years").textContent()).toMatch(/how many years/);
    await typeForm.getByLabel("Name", { exact: true }).fill(typeName);
    await typeForm.getByLabel("Description", { exact: true }).fill("Marine surveyor's reports on a vessel: hull condition, engine room, moisture readings and the surveyor's valuation.");
    await typeForm.getByLabel(/Keywords/).fill("marine survey, hull, vessel, surveyor");
    await typeForm.getByLabel("Years", { exact: true }).fill("7");
    await typeForm.getByLabel("Source", { exact: true }).fill("common practice");
    await page.screenshot({ path: "/tmp/foldwright-setup-type-form.png" }); // looked at by hand, not compared
    await page.getByTestId("save-cabinet-type").click();
    const typeRow = page.locator(`[data-testid="cabinet-type-row"][data-name="${typeName}"]`);
    await typeRow.waitFor();
    expect(await typeRow.getByTestId("learning-status").textContent()).toMatch(/Needs \d+ more filed examples/);
    await page.setViewportSize({ width: 760, height: 900 });
    await page.screenshot({ path: "/tmp/foldwright-setup-types-narrow.png", fullPage: true }); // looked at by hand, not compared
    await page.setViewportSize({ width: 1280, height: 900 });

    await page.goto(`${BASE_URL}/setup/matters`);
    await page.getByTestId("add-client").click();
    const clientForm = page.getByTestId("client-form");
    await clientForm.getByLabel("Name", { exact: true }).fill(clientName);
    await clientForm.getByLabel(/E-mail domains/).fill("heronboats.example");
    await clientForm.getByLabel(/Tax ID/).fill("123456789");
    await expect.poll(() => page.getByTestId("error-cl-tax").textContent()).toMatch(/only the last four digits/);
    await clientForm.getByLabel(/Tax ID/).fill("6789");
    await page.getByTestId("save-client").click();
    await page.locator(`[data-testid="client-row"][data-name="${clientName}"]`).waitFor();

    await page.getByTestId("add-matter").click();
    const matterForm = page.getByTestId("matter-form");
    await matterForm.getByLabel("Client", { exact: true }).selectOption({ label: clientName });
    await matterForm.getByLabel("Number", { exact: true }).fill(matterNumber);
    await matterForm.getByLabel("Title", { exact: true }).fill("Survey of the Grey Heron");
    await page.getByTestId("mt-restricted").check();
    await matterForm.locator('[data-email="clerk@example.com"]').check();
    await matterForm.locator('[data-email="partner@example.com"]').check();
    await page.getByTestId("save-matter").click();
    const matterRow = page.locator(`[data-testid="matter-row"][data-number="${matterNumber}"]`);
    await matterRow.waitFor();
    expect(await matterRow.textContent()).toContain("Restricted");
    await page.screenshot({ path: "/tmp/foldwright-setup-matters.png" });
    await page.goto(`${BASE_URL}/history/setup`);
    await page.getByTestId("setup-record-table").waitFor();
    await page.screenshot({ path: "/tmp/foldwright-setup-record.png" });
    await admin.close();

    const type = await owner("cabinet_types").where({ name: typeName }).first("id");
    const matter = await owner("matters").where({ number: matterNumber }).first("id", "restricted");
    expect(matter.restricted).toBe(1);

    // The clerk, on the team, uploads a survey and files it into the new type and matter.
    const clerkContext = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const clerk = await clerkContext.newPage();
    await signIn(clerk, "clerk@example.com");
    const fileName = `heron-survey-${stamp}.pdf`;
    const pdf = Buffer.from(await makeTextPdf([["Condition and valuation survey of the vessel Grey Heron", "The surveyor inspected the hull and engine room and took moisture readings.", `Matter ${matterNumber}`]]));
    await clerk.goto(`${BASE_URL}/intake`);
    await clerk.getByTestId("intake-input").setInputFiles([{ name: fileName, mimeType: "application/pdf", buffer: pdf }]);
    await clerk.locator(`[data-testid="intake-row"][data-name="${fileName}"] [data-state="ready"]`).waitFor({ timeout: 90_000 });
    const doc = (await owner("documents").where({ original_name: fileName }).first("id")).id as number;
    await waitFor("the suggestion", async () => (await owner("suggestions").where({ document_id: doc }).count({ n: "*" }))[0].n === 1);

    await clerk.goto(`${BASE_URL}/review?q=${encodeURIComponent(fileName)}`);
    const row = clerk.locator(`[data-testid="queue-row"][data-id="${doc}"]`);
    await row.waitFor({ timeout: 30_000 });
    await row.click();
    const panel = clerk.getByTestId("decision-panel");
    await expect.poll(() => panel.locator("h2").textContent()).toBe(fileName);
    const matterBox = panel.locator("#matter-select");
    await matterBox.fill(matterNumber);
    await clerk.locator(`[data-testid="matter-option"][data-matter-id="${matter.id}"]`).first().waitFor();
    await matterBox.press("Enter");
    const picker = panel.locator("#cabinet-picker");
    await picker.fill(typeName);
    await picker.press("Enter");
    await row.waitFor({ state: "detached", timeout: 15_000 });
    await waitFor("the filing", async () => (await owner("documents").where({ id: doc }).whereNotNull("filed_at").first("id")) ?? false, 15_000);
    await clerkContext.close();

    const clerkId = (await owner("users").where({ email: "clerk@example.com" }).first("id")).id;
    expect(await owner("documents").where({ id: doc }).first("cabinet_type_id", "matter_id", "filed_by")).toEqual({ cabinet_type_id: type.id, matter_id: matter.id, filed_by: clerkId });
    const record = await owner("setup_events").where("created_at", ">=", new Date(Number(stamp))).whereIn("entity", ["cabinet_type", "client", "matter", "team"]).select("entity", "action", "after");
    const mine = record.filter((e) => [typeName, clientName, matterNumber].some((s) => JSON.stringify(e.after).includes(s)));
    expect(mine.map((e) => `${e.entity}:${e.action}`).sort()).toEqual(["cabinet_type:created", "client:created", "matter:created", "team:member_added", "team:member_added"]);
  });
});
