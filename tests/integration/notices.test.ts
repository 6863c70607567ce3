import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { openQueuedMail } from "@/lib/data/mail-log";
import { alertAdminsOfRetrain, queueDailyDigests } from "@/lib/data/notices";
import { saveSuggestion } from "@/lib/data/suggestions";
import { ownerDb } from "../helpers/db";
import { insertUnfiledDocument, typeIds } from "../helpers/filed-documents";

// Notices: the daily To review digest (through the ethical wall, nothing when nothing waits, one
// per person per day) and the admins' alert when a retraining is rejected or fails.
const owner = ownerDb();
const day = `test-${Date.now()}`;

async function digestFor(email: string, dayKey: string) {
  const row = await owner("mail_log as l").join("users as u", "u.id", "l.user_id").where({ "u.email": email, "l.dedupe_key": `digest:${dayKey}:` + (await owner("users").where({ email }).first("id")).id }).first("l.id", "l.subject");
  return row ? { subject: row.subject as string, text: (await openQueuedMail(row.id))!.text } : null;
}

async function suggest(documentId: number, cabinetTypeId: number, confidence: number, matterId: number) {
  await saveSuggestion(null, null, {
    documentId,
    modelVersionId: null,
    method: "cold_start",
    ranked: [{ cabinetTypeId, confidence, probability: null, source: "description" }],
    noConfidentMatch: false,
    modelConfidence: null,
    why: [],
    matterCandidates: [],
    topMatterId: matterId,
    matterAmbiguous: false,
    autoFile: false,
  });
}

beforeAll(async () => {
  await owner("documents").whereNull("filed_at").update({ filed_at: new Date(), filed_how: "by_hand" }); // an empty queue
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("the daily digest", () => {
  it("sends nothing when nothing waits", async () => {
    expect(await queueDailyDigests(`${day}-empty`)).toBe(0);
    expect(await digestFor("clerk@example.com", `${day}-empty`)).toBeNull();
  });

  it("counts what waits for each person through the wall, once per day, and not for who switched it off", async () => {
    const types = await typeIds(owner);
    const open = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
    const walled = (await owner("matters").where({ restricted: true }).first("id")).id;
    const a = await insertUnfiledDocument(owner, "Invoices & receipts");
    const b = await insertUnfiledDocument(owner, "Bank & card statements");
    await suggest(a, types.get("Invoices & receipts")!, 0.42, open);
    await suggest(b, types.get("Bank & card statements")!, 0.3, walled); // only the partner (and admins) may know of it

    expect(await queueDailyDigests(day)).toBe(2); // the clerk and the partner; admins and auditors get none
    const clerk = await digestFor("clerk@example.com", day);
    const partner = await digestFor("partner@example.com", day);
    expect(clerk!.subject).toBe("1 document waits in To review");
    expect(clerk!.text).toContain("1 document waits in To review for you.");
    expect(clerk!.text).toContain("Lowest confidence: 42%");
    expect(partner!.text).toContain("2 documents wait in To review for you.");
    expect(partner!.text).toContain("Lowest confidence: 30%");
    expect(await digestFor("admin@example.com", day)).toBeNull();

    expect(await queueDailyDigests(day)).toBe(0); // a second instance's run the same day adds nothing

    await owner("users").where({ email: "clerk@example.com" }).update({ notify_digest: false });
    try {
      expect(await queueDailyDigests(`${day}-next`)).toBe(1);
      expect(await digestFor("clerk@example.com", `${day}-next`)).toBeNull();
    } finally {
      await owner("users").where({ email: "clerk@example.com" }).update({ notify_digest: true });
    }
  });
});

describe("the retraining alert", () => {
  it("tells each admin why a version was rejected or failed, and nothing for a promoted one", async () => {
    const [rejected] = await owner("model_versions").insert({ status: "rejected", trigger: "manual", reason: "Not promoted: macro-F1 0.610 is more than one point below 0.702." });
    const [failed] = await owner("model_versions").insert({ status: "failed", trigger: "nightly", reason: "Training failed: the bucket did not answer." });
    const [current] = await owner("model_versions").insert({ status: "current", trigger: "manual", reason: "Promoted." });
    const admins = await owner("users").where({ role: "admin", active: true }).whereNotNull("password_hash").count({ n: "id" });

    expect(await alertAdminsOfRetrain(rejected)).toBe(Number(admins[0].n));
    expect(await alertAdminsOfRetrain(rejected)).toBe(0); // once per version
    expect(await alertAdminsOfRetrain(failed)).toBe(Number(admins[0].n));
    expect(await alertAdminsOfRetrain(current)).toBe(0);

    const row = await owner("mail_log").where({ kind: "retrain_alert", to_address: "admin@example.com" }).where("dedupe_key", "like", `retrain:${rejected}:%`).first("id", "subject");
    expect(row.subject).toBe(`Retraining was not promoted: model version #${rejected}`);
    expect((await openQueuedMail(row.id))!.text).toContain("Reason: Not promoted: macro-F1 0.610");
  });
});
