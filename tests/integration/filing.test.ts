import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { fileDocument } from "@/lib/data/filing";
import { findDocumentForSuggestion, saveSuggestion } from "@/lib/data/suggestions";
import { computeSuggestion } from "@/lib/learning/suggest";
import { forgetServingModel } from "@/lib/learning/model-store";
import type { CurrentUser } from "@/lib/data/users";
import { appDb, ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertUnfiledDocument, typeIds } from "../helpers/filed-documents";

// Filing decisions and the append-only filing record, before any model exists (cold start).
const owner = ownerDb();
let clerk: CurrentUser;
let types: Map<string, number>;
let matterId: number;

async function suggestNow(documentId: number) {
  const doc = await findDocumentForSuggestion(documentId);
  await saveSuggestion(null, null, await computeSuggestion(doc!));
}

beforeAll(async () => {
  forgetServingModel();
  await owner("model_versions").update({ status: "retired" }); // no current model: cold start
  clerk = await demoUser("clerk@example.com");
  types = await typeIds(owner);
  matterId = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("the filing record", () => {
  it("cannot be changed or deleted by the application's database user (a real MariaDB error)", async () => {
    const docId = await insertUnfiledDocument(owner, "Invoices & receipts");
    await suggestNow(docId);
    const app = appDb();
    try {
      const [eventId] = await app("filing_events").insert({ document_id: docId, action: "suggested", reason: "inserted by the test" });
      expect(eventId).toBeGreaterThan(0);
      await expect(app("filing_events").where({ id: eventId }).update({ reason: "changed" })).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR", errno: 1142 });
      await expect(app("filing_events").where({ id: eventId }).delete()).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR", errno: 1142 });
      expect(await owner("filing_events").where({ id: eventId }).first("reason")).toEqual({ reason: "inserted by the test" });
    } finally {
      await app.destroy();
    }
  });

  it("ranks by the cabinet types' descriptions before any model exists, and says so", async () => {
    const docId = await insertUnfiledDocument(owner, "Invoices & receipts", "Invoice number 4471, amount due, please remit payment.");
    await suggestNow(docId);
    const s = await owner("suggestions").where({ document_id: docId }).first();
    expect(s).toMatchObject({ method: "cold_start", model_version_id: null, top_cabinet_type_id: types.get("Invoices & receipts") });
    const ranked = typeof s.ranked === "string" ? JSON.parse(s.ranked) : s.ranked;
    expect(ranked.reduce((a: number, r: { confidence: number }) => a + r.confidence, 0)).toBeCloseTo(1, 6);
    const event = await owner("filing_events").where({ document_id: docId, action: "suggested" }).first();
    expect(event.reason).toMatch(/descriptions and keywords: no model yet/);
  });

  it("accept, refile and file by hand each write one event with from → to, user and reason", async () => {
    const a = await insertUnfiledDocument(owner, "Invoices & receipts", "Invoice amount due subtotal remit payment.");
    const b = await insertUnfiledDocument(owner, "Invoices & receipts", "Invoice amount due subtotal remit payment.");
    const c = await insertUnfiledDocument(owner, "Payroll records");
    await suggestNow(a);
    await suggestNow(b);
    const suggested = (await owner("suggestions").where({ document_id: a }).first()).top_cabinet_type_id;

    const accepted = await fileDocument(clerk, a, { action: "accept", matterId });
    expect(accepted).toMatchObject({ action: "accepted", cabinetTypeId: suggested, matterId, filedHow: "accepted" });
    const refiled = await fileDocument(clerk, b, { action: "refile", cabinetTypeId: types.get("Correspondence"), matterId, reason: "A cover letter, not the invoice" });
    expect(refiled).toMatchObject({ action: "refiled", cabinetTypeId: types.get("Correspondence") });
    const byHand = await fileDocument(clerk, c, { action: "file", cabinetTypeId: types.get("Payroll records"), matterId });
    expect(byHand).toMatchObject({ action: "filed_by_hand", filedHow: "by_hand" });

    const ev = await owner("filing_events").whereIn("id", [accepted.eventId, refiled.eventId, byHand.eventId]).orderBy("id");
    expect(ev.map((e) => [e.action, e.user_id, e.from_cabinet_type_id, e.to_cabinet_type_id, e.to_matter_id])).toEqual([
      ["accepted", clerk.id, suggested, suggested, matterId],
      ["refiled", clerk.id, suggested, types.get("Correspondence"), matterId],
      ["filed_by_hand", clerk.id, null, types.get("Payroll records"), matterId],
    ]);
    expect(ev[1].reason).toBe("A cover letter, not the invoice");
    const doc = await owner("documents").where({ id: b }).first();
    expect(doc).toMatchObject({ cabinet_type_id: types.get("Correspondence"), matter_id: matterId, filed_by: clerk.id, filed_how: "refiled" });
  });

  it("refuses to file a document twice, and refuses a matter behind an ethical wall", async () => {
    const d = await insertUnfiledDocument(owner, "Contracts & leases");
    await fileDocument(clerk, d, { action: "file", cabinetTypeId: types.get("Contracts & leases"), matterId });
    await expect(fileDocument(clerk, d, { action: "file", cabinetTypeId: types.get("Contracts & leases"), matterId })).rejects.toMatchObject({ status: 409 });
    const walled = (await owner("matters").where({ restricted: true }).first("id")).id;
    const e = await insertUnfiledDocument(owner, "Contracts & leases");
    await expect(fileDocument(clerk, e, { action: "file", cabinetTypeId: types.get("Contracts & leases"), matterId: walled })).rejects.toMatchObject({ status: 422 });
    expect((await owner("documents").where({ id: e }).first()).filed_at).toBeNull();
  });
});
