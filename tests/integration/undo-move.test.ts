import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { fileDocument } from "@/lib/data/filing";
import { undoFilingEvent, undoFilingEvents } from "@/lib/data/filing-undo";
import { findDocumentForSuggestion, saveSuggestion } from "@/lib/data/suggestions";
import { computeSuggestion } from "@/lib/learning/suggest";
import { forgetServingModel } from "@/lib/learning/model-store";
import { listQueue } from "@/lib/data/review";
import type { CurrentUser } from "@/lib/data/users";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertUnfiledDocument, typeIds } from "../helpers/filed-documents";

// Undo writes a reversing event and puts the document back; Move needs a reason and respects the wall.
const owner = ownerDb();
let clerk: CurrentUser;
let partner: CurrentUser;
let types: Map<string, number>;
let matterId: number;
let otherMatterId: number;
let walledId: number;

const FILING_COLUMNS = ["cabinet_type_id", "matter_id", "filed_by", "filed_at", "filed_how", "confirmed_by", "confirmed_at"];
const filingOf = async (id: number) => owner("documents").where({ id }).first(FILING_COLUMNS);

async function suggested(type = "Invoices & receipts") {
  const id = await insertUnfiledDocument(owner, type, "Invoice number 4471, amount due, please remit payment.");
  await saveSuggestion(null, null, await computeSuggestion((await findDocumentForSuggestion(id))!));
  return id;
}

beforeAll(async () => {
  forgetServingModel();
  await owner("model_versions").update({ status: "retired" });
  clerk = await demoUser("clerk@example.com");
  partner = await demoUser("partner@example.com");
  types = await typeIds(owner);
  matterId = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
  otherMatterId = (await owner("matters").whereNot({ number: "AQ-2026-0101" }).where({ restricted: false }).first("id")).id;
  walledId = (await owner("matters").where({ restricted: true }).first("id")).id;
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("undo", () => {
  it("puts an accepted document back in To review with a reversing event, and deletes nothing", async () => {
    const id = await suggested();
    const before = await filingOf(id);
    const filed = await fileDocument(clerk, id, { action: "accept", matterId });
    const eventsBefore = await owner("filing_events").where({ document_id: id }).count({ n: "id" });
    const undo = await undoFilingEvent(clerk, id, filed.eventId);
    expect(undo).toMatchObject({ reversedEventId: filed.eventId, backTo: "review", cabinetTypeId: null, matterId: null });
    expect(await filingOf(id)).toEqual(before);
    const events = await owner("filing_events").where({ document_id: id }).orderBy("id");
    expect(events.length).toBe(Number(eventsBefore[0].n) + 1); // one more, none removed
    expect(events.at(-1)).toMatchObject({ action: "undone", user_id: clerk.id, reverses_event_id: filed.eventId, from_matter_id: matterId, to_matter_id: null });
    const queue = await listQueue(clerk, { list: "review", sort: "age", dir: "desc", page: 1, pageSize: 200 });
    expect(queue.items.map((i) => i.id)).toContain(id);
    // and it can be filed again
    await expect(fileDocument(clerk, id, { action: "accept", matterId })).resolves.toMatchObject({ action: "accepted" });
  });

  it("puts a moved document back in its earlier cabinet, as it was filed there", async () => {
    const id = await suggested();
    await fileDocument(clerk, id, { action: "refile", cabinetTypeId: types.get("Correspondence"), matterId });
    const before = await filingOf(id);
    const moved = await fileDocument(clerk, id, { action: "move", matterId: otherMatterId, cabinetTypeId: types.get("Contracts & leases"), reason: "wrong matter" });
    expect((await filingOf(id)).matter_id).toBe(otherMatterId);
    await undoFilingEvent(clerk, id, moved.eventId);
    expect(await filingOf(id)).toEqual(before);
  });

  it("is refused twice, for someone else's decision, and for an older decision", async () => {
    const id = await suggested();
    const filed = await fileDocument(clerk, id, { action: "accept", matterId });
    await expect(undoFilingEvent(partner, id, filed.eventId)).rejects.toMatchObject({ status: 409, code: "not_yours" });
    const moved = await fileDocument(clerk, id, { action: "move", matterId: otherMatterId, reason: "wrong matter" });
    await expect(undoFilingEvent(clerk, id, filed.eventId)).rejects.toMatchObject({ status: 409, code: "decided_since" });
    await undoFilingEvent(clerk, id, moved.eventId);
    await expect(undoFilingEvent(clerk, id, moved.eventId)).rejects.toMatchObject({ status: 409, code: "already_undone" });
    const suggestedEvent = await owner("filing_events").where({ document_id: id, action: "suggested" }).first("id");
    await expect(undoFilingEvent(clerk, id, suggestedEvent.id)).rejects.toMatchObject({ status: 409, code: "not_undoable" });
  });

  it("two undos of one decision at the same moment write one reversing event", async () => {
    const id = await suggested();
    const filed = await fileDocument(clerk, id, { action: "accept", matterId });
    const results = await Promise.allSettled([undoFilingEvent(clerk, id, filed.eventId), undoFilingEvent(clerk, id, filed.eventId)]);
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    expect(await owner("filing_events").where({ reverses_event_id: filed.eventId }).count({ n: "id" })).toEqual([{ n: 1 }]);
  });

  it("undoes a bulk accept one answer per decision", async () => {
    const a = await suggested();
    const b = await suggested();
    const fa = await fileDocument(clerk, a, { action: "accept", matterId });
    const fb = await fileDocument(clerk, b, { action: "accept", matterId });
    const results = await undoFilingEvents(clerk, [fa.eventId, fb.eventId, 999_999_999]);
    expect(results.map((r) => r.ok)).toEqual([true, true, false]);
    expect((await filingOf(a)).filed_at).toBeNull();
    expect((await filingOf(b)).filed_at).toBeNull();
  });

  it("cannot be changed later: the app's user may not update the reversing event (append-only grant)", async () => {
    const id = await suggested();
    const filed = await fileDocument(clerk, id, { action: "accept", matterId });
    const undo = await undoFilingEvent(clerk, id, filed.eventId);
    const { appDb } = await import("../helpers/db");
    const app = appDb();
    try {
      await expect(app("filing_events").where({ id: undo.eventId }).update({ reverses_event_id: null })).rejects.toMatchObject({ errno: 1142 });
    } finally {
      await app.destroy();
    }
  });
});

describe("move", () => {
  it("needs a reason for a document a person filed, and records it", async () => {
    const id = await suggested();
    await fileDocument(clerk, id, { action: "accept", matterId });
    await expect(fileDocument(clerk, id, { action: "move", matterId: otherMatterId })).rejects.toMatchObject({ status: 422 });
    await expect(fileDocument(clerk, id, { action: "move", matterId: otherMatterId, reason: "   " })).rejects.toMatchObject({ status: 422 });
    const moved = await fileDocument(clerk, id, { action: "move", matterId: otherMatterId, reason: "wrong matter" });
    expect(await owner("filing_events").where({ id: moved.eventId }).first("action", "reason", "from_matter_id", "to_matter_id")).toEqual({
      action: "moved", reason: "wrong matter", from_matter_id: matterId, to_matter_id: otherMatterId,
    });
  });

  it("into a restricted matter only for someone inside its wall", async () => {
    const id = await suggested();
    await fileDocument(clerk, id, { action: "accept", matterId });
    // The clerk is outside the demo's restricted matter (README): it is answered as if it did not exist.
    await expect(fileDocument(clerk, id, { action: "move", matterId: walledId, reason: "wrong matter" })).rejects.toMatchObject({ status: 422 });
    expect((await filingOf(id)).matter_id).toBe(matterId);
    // The partner is on its team.
    await expect(fileDocument(partner, id, { action: "move", matterId: walledId, reason: "wrong matter" })).resolves.toMatchObject({ action: "moved", matterId: walledId });
  });
});
