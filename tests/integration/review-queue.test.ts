import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { countQueueByType, listQueue, type QueueFilters } from "@/lib/data/review";
import { saveSuggestion } from "@/lib/data/suggestions";
import type { CurrentUser } from "@/lib/data/users";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertUnfiledDocument, typeIds } from "../helpers/filed-documents";

// The To review queue: sorting, filtering by confidence and cabinet type, and the ethical wall
// for documents whose suggested matter is restricted.
const owner = ownerDb();
let clerk: CurrentUser;
let partner: CurrentUser;
const ids: Record<string, number> = {};
const base: QueueFilters = { list: "review", sort: "confidence", dir: "desc", page: 1, pageSize: 200 };

async function suggest(documentId: number, cabinetTypeId: number, confidence: number, matterId: number | null) {
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
  clerk = await demoUser("clerk@example.com");
  partner = await demoUser("partner@example.com");
  const types = await typeIds(owner);
  const open = (await owner("matters").where({ number: "AQ-2026-0101" }).first("id")).id;
  const walled = (await owner("matters").where({ restricted: true }).first("id")).id;
  await owner("documents").whereNull("filed_at").update({ filed_at: new Date(), filed_how: "by_hand" }); // start from an empty queue
  ids.high = await insertUnfiledDocument(owner, "Invoices & receipts");
  ids.mid = await insertUnfiledDocument(owner, "Payroll records");
  ids.low = await insertUnfiledDocument(owner, "Contracts & leases");
  ids.walled = await insertUnfiledDocument(owner, "Contracts & leases", "Ravelston quarterly");
  await owner("documents").where({ id: ids.mid }).update({ original_name: "scan-0117_payroll.pdf" });
  await suggest(ids.high, types.get("Invoices & receipts")!, 0.93, open);
  await suggest(ids.mid, types.get("Payroll records")!, 0.71, open);
  await suggest(ids.low, types.get("Contracts & leases")!, 0.32, open);
  await suggest(ids.walled, types.get("Contracts & leases")!, 0.88, walled);
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("the To review queue", () => {
  it("sorts by confidence, highest first", async () => {
    const { items, total } = await listQueue(partner, base);
    expect(items.map((i) => i.id)).toEqual([ids.high, ids.walled, ids.mid, ids.low]);
    expect(total).toBe(4);
  });

  it("filters by a confidence range and by cabinet type", async () => {
    expect((await listQueue(partner, { ...base, minConfidence: 0.7 })).items.map((i) => i.id)).toEqual([ids.high, ids.walled, ids.mid]);
    expect((await listQueue(partner, { ...base, maxConfidence: 0.7 })).items.map((i) => i.id)).toEqual([ids.low]);
    const contracts = (await typeIds(owner)).get("Contracts & leases");
    expect((await listQueue(partner, { ...base, cabinetTypeId: contracts, sort: "age", dir: "asc" })).items.map((i) => i.id)).toEqual([ids.low, ids.walled]);
  });

  it("keeps a document suggested into a restricted matter out of an outsider's queue, counts included", async () => {
    const { items, total } = await listQueue(clerk, base);
    expect(items.map((i) => i.id)).toEqual([ids.high, ids.mid, ids.low]);
    expect(total).toBe(3);
  });

  it("pages the queue: the total stays the whole queue's, each page holds its own rows", async () => {
    const first = await listQueue(partner, { ...base, pageSize: 3, page: 1 });
    const second = await listQueue(partner, { ...base, pageSize: 3, page: 2 });
    expect(first.items.map((i) => i.id)).toEqual([ids.high, ids.walled, ids.mid]);
    expect(second.items.map((i) => i.id)).toEqual([ids.low]);
    expect([first.total, second.total]).toEqual([4, 4]);
  });

  it("sorts by upload time both ways (the newest first in one step)", async () => {
    await owner("documents").where({ id: ids.low }).update({ uploaded_at: new Date(Date.now() + 60_000) });
    const newest = await listQueue(partner, { ...base, sort: "age", dir: "desc" });
    expect(newest.items[0].id).toBe(ids.low);
    const oldest = await listQueue(partner, { ...base, sort: "age", dir: "asc" });
    expect(oldest.items.at(-1)?.id).toBe(ids.low);
  });

  it("searches the file name as typed and the words read, and never past the wall", async () => {
    // The name as typed, punctuation and all.
    expect((await listQueue(partner, { ...base, q: "scan-0117" })).items.map((i) => i.id)).toEqual([ids.mid]);
    // The words read: every word must match (as a prefix).
    expect((await listQueue(partner, { ...base, q: "ravelston quarter" })).items.map((i) => i.id)).toEqual([ids.walled]);
    expect((await listQueue(clerk, { ...base, q: "ravelston quarter" })).total).toBe(0);
    expect((await listQueue(partner, { ...base, q: "ravelston payroll-nowhere" })).total).toBe(0);
    // LIKE's own characters are taken literally.
    expect((await listQueue(partner, { ...base, q: "%" })).total).toBe(0);
    expect((await listQueue(partner, { ...base, q: "_payroll" })).items.map((i) => i.id)).toEqual([ids.mid]);
  });

  it("counts the queue per suggested cabinet type, under the other filters, behind the wall", async () => {
    const types = await typeIds(owner);
    const byName = (rows: { cabinetType: string | null; count: number }[]) => Object.fromEntries(rows.map((r) => [r.cabinetType, r.count]));
    const contracts = types.get("Contracts & leases")!;
    // The cabinet type filter is left out of the counts (they are what the filter offers).
    expect(byName(await countQueueByType(partner, { ...base, cabinetTypeId: contracts }))).toEqual({ "Contracts & leases": 2, "Invoices & receipts": 1, "Payroll records": 1 });
    expect(byName(await countQueueByType(clerk, base))).toEqual({ "Contracts & leases": 1, "Invoices & receipts": 1, "Payroll records": 1 });
    expect(byName(await countQueueByType(partner, { ...base, minConfidence: 0.7 }))).toEqual({ "Contracts & leases": 1, "Invoices & receipts": 1, "Payroll records": 1 });
  });
});
