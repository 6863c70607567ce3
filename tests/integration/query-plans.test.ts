import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { listCabinets, listDocuments } from "@/lib/data/documents";
import { listQueue } from "@/lib/data/review";
import { CSV_BATCH, listFilingEvents, streamFilingEventsCsv, toCsv } from "@/lib/data/filing-record";
import type { CurrentUser } from "@/lib/data/users";
import { findWalledMatters, whereDocumentVisible } from "@/lib/data/document-access";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";

// The lists an office of 100,000 documents uses every day, EXPLAINed as they run: each query the
// DAL sends is captured and MariaDB's plan for it (EXPLAIN FORMAT=JSON, MariaDB KB "EXPLAIN
// FORMAT=JSON") is checked for the index it must use. Plans, not timings (timings are in
// `npm run bench:scale`). 3,000 documents over 10 matters (one restricted) make a full scan the
// worse plan for the optimizer too.
const owner = ownerDb();
let clerk: CurrentUser;
let auditor: CurrentUser;
let restrictedMatter: number;

interface Access {
  table: string;
  type: string;
  key: string | null;
}

/** Every table access of a plan, subqueries included. */
function accesses(node: unknown, out: Access[] = []): Access[] {
  if (Array.isArray(node)) node.forEach((n) => accesses(n, out));
  else if (node && typeof node === "object") {
    const o = node as Record<string, unknown>;
    if (typeof o.table_name === "string" && typeof o.access_type === "string") out.push({ table: o.table_name, type: o.access_type, key: (o.key as string | undefined) ?? null });
    for (const v of Object.values(o)) accesses(v, out);
  }
  return out;
}

/** Runs `work` and returns the plans of the SELECTs it sent that mention `marker`. */
async function plansOf(work: () => Promise<unknown>, marker: RegExp): Promise<{ sql: string; plan: Access[] }[]> {
  const sent: { sql: string; bindings: unknown[] }[] = [];
  const listen = (q: { sql: string; bindings: unknown[] }) => sent.push({ sql: q.sql, bindings: q.bindings ?? [] });
  getDb().on("query", listen);
  try {
    await work();
  } finally {
    getDb().off("query", listen);
  }
  const out: { sql: string; plan: Access[] }[] = [];
  for (const q of sent.filter((s) => /^select/i.test(s.sql) && marker.test(s.sql))) {
    const [rows] = await owner.raw(`EXPLAIN FORMAT=JSON ${q.sql}`, q.bindings as never);
    out.push({ sql: q.sql, plan: accesses(JSON.parse((rows as { EXPLAIN: string }[])[0].EXPLAIN)) });
  }
  return out;
}

const on = (plan: Access[], table: string) => plan.filter((a) => a.table === table);

beforeAll(async () => {
  clerk = await demoUser("clerk@example.com");
  auditor = await demoUser("auditor@example.com");
  const [clientId] = await owner("clients").insert({ name: `Plans client ${crypto.randomUUID().slice(0, 6)}`, aliases: "[]", email_domains: "[]" });
  const matters: number[] = [];
  for (let k = 0; k < 10; k++) {
    const [id] = await owner("matters").insert({ client_id: clientId, number: `QP-${crypto.randomUUID().slice(0, 8)}`, title: `Plans ${k}`, restricted: k === 0, opened_on: "2024-01-02" });
    matters.push(id);
  }
  restrictedMatter = matters[0];
  const types: number[] = await owner("cabinet_types").where({ active: true }).limit(5).pluck("id");
  const rows = Array.from({ length: 3_000 }, (_, i) => ({
    sha256: crypto.createHash("sha256").update(`plans-${i}-${crypto.randomUUID()}`).digest("hex"),
    original_name: `plans-${i}.pdf`,
    media_type: "application/pdf",
    size_bytes: 100,
    storage_key: `plans/${crypto.randomUUID()}`,
    status: "ready",
    text: `Plans document ${i} quarterly ledger ${i % 7 === 0 ? "zanzibarite" : "ordinary"} words`,
    uploaded_by: clerk.id,
    ...(i % 20 !== 0 ? { matter_id: matters[i % 10], cabinet_type_id: types[i % types.length], filed_at: new Date(Date.now() - i * 60_000), filed_by: clerk.id, filed_how: "by_hand" } : {}),
  }));
  for (let i = 0; i < rows.length; i += 500) await owner("documents").insert(rows.slice(i, i + 500));
  const docs: { id: number; matter_id: number | null }[] = await owner("documents").where("original_name", "like", "plans-%").select("id", "matter_id");
  const filed = docs.filter((d) => d.matter_id !== null);
  for (let i = 0; i < filed.length; i += 500) {
    const slice = filed.slice(i, i + 500);
    await owner("document_matter_links").insert(slice.map((d) => ({ document_id: d.id, matter_id: d.matter_id, how: "filed" }))).onConflict(["document_id", "matter_id"]).ignore();
    await owner("filing_events").insert(slice.map((d) => ({ document_id: d.id, user_id: clerk.id, action: "filed_by_hand", to_matter_id: d.matter_id })));
  }
  await owner.raw("ANALYZE TABLE documents, document_matter_links, filing_events, suggestions");
});
afterAll(async () => {
  // Its 3,000 filed rows must not reach the next file's training set (retrain.test.ts expects only
  // its own documents): remove them and every row that points at them.
  const ids: number[] = await owner("documents").where("original_name", "like", "plans-%").pluck("id");
  const refs: { t: string; c: string }[] = (
    await owner.raw(
      "SELECT TABLE_NAME AS t, COLUMN_NAME AS c FROM information_schema.KEY_COLUMN_USAGE WHERE TABLE_SCHEMA = DATABASE() AND REFERENCED_TABLE_NAME = 'documents'",
    )
  )[0];
  for (let i = 0; i < ids.length; i += 500) {
    const slice = ids.slice(i, i + 500);
    for (const { t, c } of refs) if (t !== "filing_events") await owner(t).whereIn(c, slice).delete();
    // Events that reverse one of these point at it: the later ones go first.
    await owner("filing_events").whereIn("document_id", slice).orderBy("id", "desc").delete();
    await owner("documents").whereIn("id", slice).delete();
  }
  await owner.destroy();
  await closeDb();
});

describe("query plans at scale", () => {
  it("the wall written against the walled matters' list keeps exactly the documents the per-row rule keeps", async () => {
    // A document filed in an open matter but once a candidate of the restricted one stays walled.
    const open = await owner("documents").where("original_name", "like", "plans-%").whereNot({ matter_id: restrictedMatter }).whereNotNull("matter_id").first("id");
    await owner("document_matter_links").insert({ document_id: open.id, matter_id: restrictedMatter, how: "candidate" }).onConflict(["document_id", "matter_id"]).ignore();
    for (const user of [clerk, auditor]) {
      const ids = async (walled?: Awaited<ReturnType<typeof findWalledMatters>>) =>
        (await whereDocumentVisible(getDb()("documents as d"), user, "d", walled).orderBy("d.id").pluck("d.id")).map(Number);
      const perRow = await ids();
      const listed = await ids(await findWalledMatters(user));
      expect(listed).toEqual(perRow);
      expect(listed).not.toContain(open.id);
      expect(listed.length).toBeLessThan(Number((await owner("documents").count({ n: "*" }))[0].n));
    }
    await expect(async () => whereDocumentVisible(getDb()("documents as d"), clerk, "d", await findWalledMatters(auditor))).rejects.toThrow(/another user/);
  });

  it("the wall is one materialised lookup of the walled matters' links, not a scan per row", async () => {
    expect(restrictedMatter).toBeGreaterThan(0);
    const plans = await plansOf(() => listCabinets(clerk), /document_matter_links/);
    expect(plans.length).toBeGreaterThan(0);
    for (const { plan } of plans) {
      const links = on(plan, "wl");
      expect(links.length).toBe(1);
      // (matter_id, document_id): the walled matters' links read by their matter.
      expect(links[0].key).toBe("document_matter_links_matter_id_document_id_index");
    }
  });

  it("Cabinets counts per matter and cabinet type from the covering index", async () => {
    const [count] = await plansOf(() => listCabinets(clerk), /group by/i);
    const d = on(count.plan, "d");
    expect(d).toHaveLength(1);
    expect(["documents_matter_type_filed_index", "documents_matter_id_cabinet_type_id_index"]).toContain(d[0].key);
  });

  it("a matter's cabinet lists its documents newest first through (matter_id, filed_at)", async () => {
    const any = (await owner("matters").where("number", "like", "QP-%").whereNot({ id: restrictedMatter }).first("id")).id;
    const plans = await plansOf(() => listDocuments(clerk, { filed: true, matterId: any, page: 1, pageSize: 50 }), /limit/i);
    const d = on(plans[0].plan, "d");
    expect(d[0].key).toMatch(/^documents_matter_(filed|type_filed)_index$|^documents_matter_id_cabinet_type_id_index$/);
    expect(d[0].type).not.toBe("ALL");
  });

  it("search uses the full-text index", async () => {
    const plans = await plansOf(() => listDocuments(clerk, { q: "zanzibarite", page: 1, pageSize: 50 }), /match/i);
    expect(plans.length).toBeGreaterThan(0);
    for (const { plan } of plans) expect(on(plan, "d")[0]).toMatchObject({ type: "fulltext", key: "documents_text_fulltext" });
  });

  it("To review reads the unfiled documents by filed_at, and each one's latest suggestion by (document_id, id)", async () => {
    const plans = await plansOf(() => listQueue(clerk, { list: "review", sort: "age", dir: "asc", page: 1, pageSize: 50 }), /limit/i);
    const plan = plans[0].plan;
    const d = on(plan, "d")[0];
    expect(d.type).not.toBe("ALL");
    expect(d.key).toBe("documents_filed_at_index");
    for (const x of on(plan, "x")) expect(x.key).toBe("suggestions_document_id_id_index");
  });

  it("History with an action filter walks (action, id); the streamed CSV pages by the primary key", async () => {
    // A rare action (a few "moved" among thousands of filings): read through (action, id).
    const some: number[] = await owner("documents").where("original_name", "like", "plans-%").whereNotNull("matter_id").limit(5).pluck("id");
    await owner("filing_events").insert(some.map((id) => ({ document_id: id, user_id: clerk.id, action: "moved" })));
    await owner.raw("ANALYZE TABLE filing_events");
    const [page] = await plansOf(() => listFilingEvents(auditor, { action: "moved", page: 1, pageSize: 100 }), /limit/i);
    expect(on(page.plan, "e")[0].key).toBe("filing_events_action_id_index");
    expect(on(page.plan, "d")[0]).toMatchObject({ type: "eq_ref", key: "PRIMARY" });
    // The most common action, newest first: the primary key read backwards is as good (no sort).
    const [common] = await plansOf(() => listFilingEvents(auditor, { action: "filed_by_hand", page: 1, pageSize: 100 }), /limit/i);
    expect(["PRIMARY", "filing_events_action_id_index"]).toContain(on(common.plan, "e")[0].key);
    const plans = await plansOf(async () => {
      const reader = streamFilingEventsCsv(auditor, {}).getReader();
      for (let i = 0; i < 3; i++) await reader.read(); // the header and two batches
      await reader.cancel();
    }, /limit/i);
    expect(plans.length).toBeGreaterThanOrEqual(2);
    for (const { plan } of plans) {
      expect(on(plan, "e")[0]).toMatchObject({ key: "PRIMARY" });
      expect(on(plan, "d")[0]).toMatchObject({ type: "eq_ref", key: "PRIMARY" });
    }
  });

  it("streams the same CSV as the list gives, a batch at a time, behind the same wall", async () => {
    const { items, total } = await listFilingEvents(auditor, { page: 1, pageSize: 10_000 });
    expect(total).toBeGreaterThan(CSV_BATCH * 2); // several batches
    expect(total).toBeLessThanOrEqual(10_000);
    const streamed = await new Response(streamFilingEventsCsv(auditor, {})).text();
    expect(streamed).toBe(toCsv(items));
  });
});
