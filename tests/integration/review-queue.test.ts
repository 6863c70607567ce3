import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { listQueue, type QueueFilters } from "@/lib/data/review";
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
  ids.walled = await insertUnfiledDocument(owner, "Contracts & leases");
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
});
