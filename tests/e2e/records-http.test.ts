import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { ownerDb } from "../helpers/db";
import { insertStoredFiledDocument, yearsAgo, type StoredDoc } from "../helpers/records";

// Records through the real routes: the retention date in the API, the two-person rule's answer,
// and the ethical wall on holds, the due list, batches and certificates (the restricted demo
// matter AQ-2026-0131's team is the partner; clerks and auditors are outside it).
const owner = ownerDb();
const c = {} as Record<"clerk" | "partner" | "admin" | "auditor", Client>;
let walledDoc: StoredDoc;
let openDoc: StoredDoc;
let walledMatter: number;

const json = async (client: Client, method: string, path: string, body?: unknown) => {
  const res = await client.request(method, path, body);
  return { status: res.status, body: await res.json() };
};
const text = async (client: Client, path: string) => (await client.request("GET", path)).text();

beforeAll(async () => {
  for (const role of ["clerk", "partner", "admin", "auditor"] as const) c[role] = await Client.signedIn(`${role}@example.com`);
  walledDoc = await insertStoredFiledDocument(owner, { matterNumber: "AQ-2026-0131", typeName: "Invoices & receipts", filedAt: yearsAgo(9), label: "carrier-freight-invoice" });
  openDoc = await insertStoredFiledDocument(owner, { matterNumber: "AQ-2026-0102", typeName: "Invoices & receipts", filedAt: yearsAgo(9), label: "shop-fitting-invoice" });
  walledMatter = (await owner("matters").where({ number: "AQ-2026-0131" }).first("id")).id;
});
afterAll(async () => {
  await owner.destroy();
});

describe("records through the API", () => {
  it("a document answers its retention date and hold state", async () => {
    const { status, body } = await json(c.clerk, "GET", `/api/documents/${openDoc.id}`);
    expect(status).toBe(200);
    expect(body.document).toMatchObject({ legalHold: false, disposedAt: null, retention: { basis: "after_filing", rule: "7 years after filing" } });
    expect(body.document.retention.dueOn).toMatch(/^\d{4}-01-15$/);
    expect(body.holds).toEqual([]);
    const past = await json(c.clerk, "GET", "/api/documents?filed=1&retention=past_due&pageSize=200");
    expect(past.body.items.map((d: { id: number }) => d.id)).toContain(openDoc.id);
    expect((await json(c.clerk, "GET", "/api/documents?retention=soon")).status).toBe(422);
  });

  it("a hold on the restricted matter reaches its team only", async () => {
    const placed = await json(c.partner, "POST", "/api/holds", { matterId: walledMatter, reason: "Carrier dispute: preserve everything", reference: "CV-2026-0042" });
    expect(placed.status).toBe(201);
    try {
      for (const outsider of [c.clerk, c.auditor]) {
        const seen = await text(outsider, "/api/holds?status=all&pageSize=200");
        expect(seen).not.toContain("CV-2026-0042");
        expect(seen).not.toContain("AQ-2026-0131");
        expect((await json(outsider, "POST", "/api/holds", { documentId: walledDoc.id, reason: "Trying", reference: "X" })).status).toBe(403);
      }
      expect(await text(c.partner, "/api/holds")).toContain("CV-2026-0042");
      const held = await json(c.partner, "GET", `/api/documents/${walledDoc.id}`);
      expect(held.body.document.legalHold).toBe(true);
      expect(held.body.holds.map((h: { reference: string }) => h.reference)).toEqual(["CV-2026-0042"]);
      expect(await text(c.partner, "/api/disposal/due?pageSize=500")).not.toContain(walledDoc.name); // held
    } finally {
      expect((await json(c.partner, "POST", `/api/holds/${placed.body.hold.id}/release`, { reason: "Dispute settled" })).status).toBe(200);
    }
  });

  it("the due list, a batch and its certificate never show the restricted matter to outsiders; the proposer cannot approve", async () => {
    expect(await text(c.partner, "/api/disposal/due?pageSize=500")).toContain(walledDoc.name);
    expect(await text(c.auditor, "/api/disposal/due?pageSize=500")).not.toContain(walledDoc.name);
    const proposed = await json(c.admin, "POST", "/api/disposal/batches", { documentIds: [walledDoc.id], note: "Carrier invoices past seven years" });
    expect(proposed.status).toBe(201);
    const id = proposed.body.batch.id as number;
    const own = await json(c.admin, "POST", `/api/disposal/batches/${id}/approve`);
    expect(own.status).toBe(403);
    expect(own.body.error).toMatchObject({ code: "two_person_rule" });
    expect(own.body.error.message).toMatch(/^You proposed this batch, so you cannot approve it: .+\. Nothing was destroyed\.$/);

    expect((await json(c.partner, "POST", `/api/disposal/batches/${id}/approve`)).body).toMatchObject({ disposed: 1, keptHold: 0 });
    const auditorList = await json(c.auditor, "GET", "/api/disposal/batches?pageSize=500");
    expect(auditorList.body.items.map((b: { id: number }) => b.id)).not.toContain(id);
    expect((await c.auditor.request("GET", `/api/disposal/batches/${id}/certificate?format=csv`)).status).toBe(403);
    const csv = await c.partner.request("GET", `/api/disposal/batches/${id}/certificate?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-type")).toContain("text/csv");
    expect(await csv.text()).toContain(walledDoc.name);
    const pdf = await c.partner.request("GET", `/api/disposal/batches/${id}/certificate?format=pdf`);
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.from(await pdf.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
    expect((await c.partner.request("GET", `/api/documents/${walledDoc.id}/original`)).status).toBe(410);
  });
});
