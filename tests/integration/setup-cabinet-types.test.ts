import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { closeDb } from "@/db";
import { appendFilingEvent } from "@/lib/data/record";
import { listFilingEvents } from "@/lib/data/filing-record";
import { createCabinetType, listCabinetTypesWithCounts, mergeCabinetType, updateCabinetType } from "@/lib/data/setup-cabinet-types";
import { findDocumentForSuggestion, saveSuggestion } from "@/lib/data/suggestions";
import { forgetServingModel } from "@/lib/learning/model-store";
import { requestRetrain, runTraining } from "@/lib/learning/retrain";
import { computeSuggestion } from "@/lib/learning/suggest";
import type { CurrentUser } from "@/lib/data/users";
import { appDb, ownerDb } from "../helpers/db";
import { insertFiledDocuments, insertReadDocument, insertUnfiledDocument, typeIds } from "../helpers/filed-documents";
import { demoUser } from "../helpers/users";

// Cabinet types through the Data Access Layer against the real MariaDB: every change on the
// setup record, rename keeping the names events had, merge moving every document with one event
// each, and the serving model never suggesting a retired type.
const owner = ownerDb();
let admin: CurrentUser;
let auditor: CurrentUser;
const unique = () => `${Date.now()}-${Math.floor(Math.random() * 1e6)}`;
const base = { description: "Papers about a test subject.", keywords: ["test"], retentionYears: 7, retentionTrigger: "after_filing" as const, retentionSource: "common practice" };
const pause = () => new Promise((r) => setTimeout(r, 15)); // distinct millisecond timestamps on the two records

beforeAll(async () => {
  admin = await demoUser("admin@example.com");
  auditor = await demoUser("auditor@example.com");
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

const lastSetupEvent = (entityId: number) => owner("setup_events").where({ entity: "cabinet_type", entity_id: entityId }).orderBy("id", "desc").first();

describe("creating and changing cabinet types", () => {
  it("creates a type and writes a 'created' setup event with the whole type", async () => {
    const t = await createCabinetType(admin, { ...base, name: `Survey reports ${unique()}` });
    expect(t).toMatchObject({ active: true, retentionYears: 7, retentionTrigger: "after_filing" });
    const e = await lastSetupEvent(t.id);
    expect(e).toMatchObject({ action: "created", user_id: admin.id, before: null });
    expect(e.after).toMatchObject({ name: t.name, keywords: ["test"], retentionSource: "common practice" });
  });

  it("refuses a duplicate name (any letter case) with a 409 sentence naming it", async () => {
    const name = `Duplicate probe ${unique()}`;
    await createCabinetType(admin, { ...base, name });
    await expect(createCabinetType(admin, { ...base, name: name.toUpperCase() })).rejects.toMatchObject({ status: 409, message: expect.stringContaining(`named "${name}" already exists`) });
  });

  it("checks the retention pair on the merged row: a permanent type given years is refused", async () => {
    const t = await createCabinetType(admin, { ...base, name: `Retention probe ${unique()}`, retentionTrigger: "permanent", retentionYears: null });
    await expect(updateCabinetType(admin, t.id, { retentionYears: 5 })).rejects.toBeInstanceOf(ZodError);
    // Switching to permanent drops the years without a second field.
    const u = await createCabinetType(admin, { ...base, name: `Retention probe ${unique()}` });
    expect(await updateCabinetType(admin, u.id, { retentionTrigger: "permanent" })).toMatchObject({ retentionTrigger: "permanent", retentionYears: null });
  });

  it("retires and restores, each its own event; a retired type still lists with ?all", async () => {
    const t = await createCabinetType(admin, { ...base, name: `Retire probe ${unique()}` });
    await updateCabinetType(admin, t.id, { active: false });
    expect(await lastSetupEvent(t.id)).toMatchObject({ action: "retired", before: { name: t.name, active: true }, after: { name: t.name, active: false } });
    expect((await listCabinetTypesWithCounts()).find((x) => x.id === t.id)?.active).toBe(false);
    await updateCabinetType(admin, t.id, { active: true });
    expect((await lastSetupEvent(t.id)).action).toBe("restored");
  });

  it("suggests again the documents waiting in To review whose suggestion put a just-retired type on top", async () => {
    const t = await createCabinetType(admin, { ...base, name: `Resuggest probe ${unique()}` });
    const waiting = await insertReadDocument(owner, "Waiting for review.", "waiting.pdf");
    await saveSuggestion(null, null, { documentId: waiting, modelVersionId: null, method: "cold_start", ranked: [{ cabinetTypeId: t.id, confidence: 1, probability: null, source: "description" }], noConfidentMatch: false, modelConfidence: null, why: [], matterCandidates: [], topMatterId: null, matterAmbiguous: false, autoFile: false });
    const queued = () => owner("jobs").where({ kind: "suggest", document_id: waiting, status: "queued" }).count({ n: "*" });
    expect(await queued()).toEqual([{ n: 0 }]);
    await updateCabinetType(admin, t.id, { active: false });
    expect(await queued()).toEqual([{ n: 1 }]);
    await owner("jobs").where({ kind: "suggest", document_id: waiting }).delete();
  });
});

describe("rename", () => {
  it("keeps the name each filing event had, on the record and in its export", async () => {
    const oldName = `Old name ${unique()}`;
    const t = await createCabinetType(admin, { ...base, name: oldName });
    const doc = await insertReadDocument(owner, "A document filed before the rename.", "before-rename.pdf");
    const before = await appendFilingEvent(owner, { documentId: doc, userId: admin.id, action: "filed_by_hand", toCabinetTypeId: t.id });
    await pause();
    const newName = `New name ${unique()}`;
    await updateCabinetType(admin, t.id, { name: newName });
    expect(await lastSetupEvent(t.id)).toMatchObject({ action: "renamed", before: { name: oldName }, after: { name: newName } });
    await pause();
    const after = await appendFilingEvent(owner, { documentId: doc, userId: admin.id, action: "moved", fromCabinetTypeId: t.id, toCabinetTypeId: t.id, reason: "test" });
    const { items } = await listFilingEvents(auditor, { documentId: doc, page: 1, pageSize: 10 });
    expect(items.find((e) => e.id === before)?.toCabinetType).toBe(oldName);
    expect(items.find((e) => e.id === after)).toMatchObject({ fromCabinetType: newName, toCabinetType: newName });
  });
});

describe("merge", () => {
  it("moves every filed document, writes one 'moved' event per document with the reason 'merged', and retires the old type", async () => {
    const from = await createCabinetType(admin, { ...base, name: `Merge from ${unique()}` });
    const into = await createCabinetType(admin, { ...base, name: `Merge into ${unique()}` });
    const clerk = await owner("users").where({ email: "clerk@example.com" }).first("id");
    const docs: number[] = [];
    for (let i = 0; i < 3; i++) docs.push(await insertReadDocument(owner, `Merge document ${i}.`, `merge-${i}.pdf`, { cabinet_type_id: from.id, filed_at: new Date(), filed_by: clerk.id, filed_how: "by_hand" }));
    const result = await mergeCabinetType(admin, from.id, into.id);
    expect(result.movedDocuments).toBe(3);
    expect(await owner("documents").whereIn("id", docs).pluck("cabinet_type_id")).toEqual([into.id, into.id, into.id]);
    const events = await owner("filing_events").whereIn("document_id", docs).where({ action: "moved" }).select("document_id", "from_cabinet_type_id", "to_cabinet_type_id", "reason", "user_id");
    expect(events.map((e) => e.document_id).sort()).toEqual([...docs].sort());
    expect(events.every((e) => e.reason === "merged" && e.from_cabinet_type_id === from.id && e.to_cabinet_type_id === into.id && e.user_id === admin.id)).toBe(true);
    expect((await owner("cabinet_types").where({ id: from.id }).first("active")).active).toBe(0);
    expect(await lastSetupEvent(from.id)).toMatchObject({ action: "merged", after: { mergedIntoId: into.id, movedDocuments: 3 } });
  });

  it("refuses merging into itself or into a retired type, and moves nothing", async () => {
    const a = await createCabinetType(admin, { ...base, name: `Merge refuse ${unique()}` });
    const b = await createCabinetType(admin, { ...base, name: `Merge retired ${unique()}` });
    await updateCabinetType(admin, b.id, { active: false });
    await expect(mergeCabinetType(admin, a.id, a.id)).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/cannot be merged into itself/) });
    await expect(mergeCabinetType(admin, a.id, b.id)).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/is retired/) });
    expect((await owner("cabinet_types").where({ id: a.id }).first("active")).active).toBe(1);
  });
});

describe("the serving model and retired or new types", () => {
  let payrollId: number;
  beforeAll(async () => {
    await owner("model_versions").whereIn("status", ["current", "candidate"]).update({ status: "retired" });
    await insertFiledDocuments(owner, 12);
    forgetServingModel();
    const r = await requestRetrain("manual", null);
    if (r.status !== "queued") throw new Error(`expected a queued run, got ${JSON.stringify(r)}`);
    expect(await runTraining(r.versionId)).toBe(true);
    payrollId = (await typeIds(owner)).get("Payroll records")!;
  });

  const rankedFor = async (id: number) => (await computeSuggestion((await findDocumentForSuggestion(id))!)).ranked.map((r) => r.cabinetTypeId);

  it("never suggests a retired type (train, retire, suggest), and suggests it again once restored", async () => {
    const doc = await insertUnfiledDocument(owner, "Payroll records");
    expect((await rankedFor(doc))[0]).toBe(payrollId); // the trained model knows payroll well
    await updateCabinetType(admin, payrollId, { active: false });
    try {
      expect(await rankedFor(doc)).not.toContain(payrollId);
    } finally {
      await updateCabinetType(admin, payrollId, { active: true });
    }
    expect((await rankedFor(doc))[0]).toBe(payrollId);
  });

  it("ranks a new type with a good description in the top three for a matching document, before any example is filed", async () => {
    const t = await createCabinetType(admin, {
      name: `Vessel survey reports ${unique()}`,
      description: "Marine surveyor's reports on a vessel: hull condition, engine room, moisture readings, safety equipment and the surveyor's valuation.",
      keywords: ["marine survey", "hull", "vessel", "surveyor", "seaworthiness"],
      retentionYears: 7,
      retentionTrigger: "after_filing",
      retentionSource: "common practice",
    });
    try {
      const doc = await insertReadDocument(
        owner,
        "Condition and valuation survey of the vessel Grey Heron. The surveyor inspected the hull below the waterline, took moisture readings, checked the engine room and the safety equipment, and finds the vessel seaworthy. Surveyor's valuation attached.",
        "heron-marine-survey.pdf",
      );
      const ranked = await rankedFor(doc);
      expect(ranked.slice(0, 3)).toContain(t.id);
    } finally {
      await updateCabinetType(admin, t.id, { active: false });
    }
  });
});

describe("the setup record's database grants", () => {
  it("lets the app's database user insert and read setup events, never change or delete them", async () => {
    const app = appDb();
    try {
      const [id] = await app("setup_events").insert({ entity: "settings", action: "changed", reason: "inserted by the test" });
      await expect(app("setup_events").where({ id }).update({ reason: "changed" })).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR" });
      await expect(app("setup_events").where({ id }).delete()).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR" });
      expect((await owner("setup_events").where({ id }).first("reason")).reason).toBe("inserted by the test");
    } finally {
      await app.destroy();
    }
  });
});
