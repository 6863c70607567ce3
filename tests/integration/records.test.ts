import { parse } from "csv-parse/sync";
import { PDFParse } from "pdf-parse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { getCertificate } from "@/lib/data/certificate";
import { listDue, proposeBatch } from "@/lib/data/disposal";
import { getBatch, listBatches } from "@/lib/data/disposal-batches";
import { approveBatch, rejectBatch } from "@/lib/data/disposal-decide";
import { getDocument, listDocuments } from "@/lib/data/documents";
import { listHolds, placeHold, releaseHold } from "@/lib/data/holds";
import type { CurrentUser } from "@/lib/data/users";
import { certificateCsv } from "@/lib/records/certificate-csv";
import { certificatePdf } from "@/lib/records/certificate-pdf";
import { RETENTION_CAUTION } from "@/lib/retention";
import { headObject } from "@/storage/s3";
import { appDb, ownerDb } from "../helpers/db";
import { ensureSecondAdmin, insertStoredFiledDocument, yearsAgo, type StoredDoc } from "../helpers/records";
import { demoUser } from "../helpers/users";

// Legal holds and disposal with two people, against the real MariaDB and the real S3 fake.
const owner = ownerDb();
let clerk: CurrentUser, partner: CurrentUser, admin: CurrentUser, auditor: CurrentUser, admin2: CurrentUser;
let bakery: number; // AQ-2026-0101: clerk and partner on the team
let dental: number; // AQ-2026-0123: only the clerk on the team
let walled: number; // AQ-2026-0131: restricted, the partner is its team

const pastDue = (label: string, matterNumber = "AQ-2026-0101") => insertStoredFiledDocument(owner, { matterNumber, typeName: "Invoices & receipts", filedAt: yearsAgo(8), label });
const dueIds = async (user: CurrentUser) => (await listDue(user, { page: 1, pageSize: 500 })).items.map((d) => d.id);
const error = (status: number, code: string) => expect.objectContaining({ status, code });

beforeAll(async () => {
  [clerk, partner, admin, auditor] = await Promise.all(["clerk", "partner", "admin", "auditor"].map((r) => demoUser(`${r}@example.com`)));
  admin2 = await ensureSecondAdmin(owner);
  const id = async (number: string) => (await owner("matters").where({ number }).first("id")).id as number;
  [bakery, dental, walled] = await Promise.all([id("AQ-2026-0101"), id("AQ-2026-0123"), id("AQ-2026-0131")]);
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("legal holds", () => {
  it("a hold on the matter takes its documents off the due list and out of a proposal; lifting it makes them due again", async () => {
    const doc = await pastDue("held-by-matter");
    expect(await dueIds(admin)).toContain(doc.id);
    const hold = await placeHold(partner, { matterId: bakery, reason: "Litigation expected over the 2025 return", reference: "REQ-2026-014" });
    expect(hold).toMatchObject({ scope: "matter", matter: "AQ-2026-0101", placedBy: "Oluwaseun Hartley", releasedAt: null });
    try {
      expect(await dueIds(admin)).not.toContain(doc.id);
      expect((await getDocument(clerk, doc.id)).legalHold).toBe(true);
      await expect(proposeBatch(admin, { documentIds: [doc.id], note: "Yearly clear-out" })).rejects.toEqual(error(409, "not_disposable"));
      await expect(proposeBatch(admin, { documentIds: [doc.id], note: "Yearly clear-out" })).rejects.toThrow(/under a legal hold/);
    } finally {
      await releaseHold(partner, hold.id, "The request was withdrawn");
    }
    expect(await dueIds(admin)).toContain(doc.id);
    expect((await getDocument(clerk, doc.id)).legalHold).toBe(false);
    const events = await owner("hold_events").where({ hold_id: hold.id }).orderBy("id");
    expect(events.map((e) => [e.action, e.user_id, e.reason])).toEqual([
      ["placed", partner.id, "Litigation expected over the 2025 return"],
      ["released", partner.id, "The request was withdrawn"],
    ]);
  });

  it("only a partner on the matter or an admin places or lifts one, and never twice at once", async () => {
    const doc = await pastDue("dental-invoice", "AQ-2026-0123");
    await expect(placeHold(partner, { matterId: dental, reason: "Audit request", reference: "A-1" })).rejects.toEqual(error(403, "not_on_matter"));
    await expect(placeHold(clerk, { documentId: doc.id, reason: "Audit request", reference: "A-1" })).rejects.toEqual(error(403, "not_on_matter"));
    const hold = await placeHold(admin, { documentId: doc.id, reason: "Audit request", reference: "A-1" });
    await expect(placeHold(admin, { documentId: doc.id, reason: "Again", reference: "A-2" })).rejects.toEqual(error(409, "already_held"));
    await expect(releaseHold(partner, hold.id, "Done with it")).rejects.toEqual(error(403, "not_on_matter"));
    await releaseHold(admin, hold.id, "Audit closed");
    await expect(releaseHold(admin, hold.id, "Audit closed")).rejects.toEqual(error(409, "already_released"));
  });

  it("a hold on a restricted matter or its document never reaches someone outside the team", async () => {
    const doc = await pastDue("carrier-invoice", "AQ-2026-0131");
    const onMatter = await placeHold(partner, { matterId: walled, reason: "Carrier dispute", reference: "CV-2026-0042" });
    const onDoc = await placeHold(admin, { documentId: doc.id, reason: "Carrier dispute, invoice", reference: "CV-2026-0042" });
    try {
      for (const outsider of [clerk, auditor]) {
        const seen = (await listHolds(outsider, { status: "all", page: 1, pageSize: 200 })).items.map((h) => h.id);
        expect(seen).not.toContain(onMatter.id);
        expect(seen).not.toContain(onDoc.id);
        await expect(releaseHold(outsider, onMatter.id, "Trying")).rejects.toEqual(error(404, "not_found"));
        await expect(placeHold(outsider, { documentId: doc.id, reason: "Trying", reference: "X" })).rejects.toEqual(error(403, "restricted_matter"));
      }
      const team = (await listHolds(partner, { status: "active", page: 1, pageSize: 200 })).items.map((h) => h.id);
      expect(team).toEqual(expect.arrayContaining([onMatter.id, onDoc.id]));
    } finally {
      await releaseHold(partner, onMatter.id, "Settled");
      await releaseHold(admin, onDoc.id, "Settled");
    }
  });
});

describe("disposal with two people", () => {
  let a: StoredDoc, b: StoredDoc;
  let batchId: number;

  it("the proposer cannot approve (403 with a sentence); a hold placed after the proposal keeps its document at approval", async () => {
    [a, b] = [await pastDue("old-invoice-a"), await pastDue("old-invoice-b")];
    batchId = await proposeBatch(admin, { documentIds: [a.id, b.id], note: "Invoices past seven years" });
    await expect(proposeBatch(admin, { documentIds: [a.id], note: "Again" })).rejects.toThrow(/already wait in a proposed batch/);
    const refused = approveBatch(admin, batchId);
    await expect(refused).rejects.toEqual(error(403, "two_person_rule"));
    await expect(approveBatch(admin, batchId)).rejects.toThrow(/You proposed this batch, so you cannot approve it.*Nothing was destroyed\./);
    await expect(approveBatch(clerk, batchId)).rejects.toEqual(error(403, "not_allowed"));

    const hold = await placeHold(partner, { documentId: b.id, reason: "Client asked to keep it", reference: "REQ-77" });
    const result = await approveBatch(partner, batchId);
    expect(result).toMatchObject({ disposed: 1, keptHold: 1, keptNotDue: 0, pendingDeletion: 0 });
    expect(await headObject(a.key)).toBeNull(); // HeadObject on the real S3 fake: not found
    expect(await headObject(b.key)).not.toBeNull();
    await releaseHold(partner, hold.id, "No longer needed");
  });

  it("leaves a tombstone and its events; the original is gone and the app's database user still cannot change the record", async () => {
    const row = await owner("documents").where({ id: a.id }).first();
    expect(row).toMatchObject({ original_name: a.name, text: null, disposal_batch_id: batchId });
    expect(row.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(row.disposed_at).not.toBeNull();
    const tomb = await getDocument(partner, a.id);
    expect(tomb).toMatchObject({ name: a.name, matter: "AQ-2026-0101", cabinetType: "Invoices & receipts", text: null });
    expect(tomb.disposedAt).not.toBeNull();
    expect(tomb.retention.rule).toBe("7 years after filing");

    const disposed = await owner("filing_events").where({ document_id: a.id, action: "disposed" });
    expect(disposed).toHaveLength(1);
    expect(disposed[0]).toMatchObject({ user_id: partner.id, from_matter_id: bakery });
    expect(disposed[0].reason).toMatch(/proposed by .*, approved by Oluwaseun Hartley/);
    expect(await owner("filing_events").where({ document_id: b.id, action: "disposed" })).toHaveLength(0);

    const holdEvent = await owner("hold_events").orderBy("id", "desc").first("id", "reason");
    const app = appDb();
    try {
      for (const [table, id] of [["filing_events", disposed[0].id], ["hold_events", holdEvent.id]]) {
        await expect(app(table).where({ id }).update({ reason: "changed" })).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR" });
        await expect(app(table).where({ id }).delete()).rejects.toMatchObject({ code: "ER_TABLEACCESS_DENIED_ERROR" });
      }
    } finally {
      await app.destroy();
    }
    expect(await owner("filing_events").where({ id: disposed[0].id }).first("reason")).toEqual({ reason: disposed[0].reason });
    expect(await owner("hold_events").where({ id: holdEvent.id }).first("id", "reason")).toEqual(holdEvent);
  });

  it("its certificate lists exactly the documents destroyed, with the rule, the decision and the caution", async () => {
    const cert = await getCertificate(auditor, batchId);
    expect(cert.destroyed.map((i) => i.documentId)).toEqual([a.id]);
    expect(cert.kept.map((i) => [i.documentId, i.outcome])).toEqual([[b.id, "kept_hold"]]);
    expect(cert).toMatchObject({ proposedBy: admin.name, approvedBy: "Oluwaseun Hartley", caution: RETENTION_CAUTION });

    const rows = parse(certificateCsv(cert), { columns: true, comment: "#" }) as Record<string, string>[];
    expect(rows.map((r) => Number(r.document_id))).toEqual([a.id]);
    expect(rows[0]).toMatchObject({ batch: String(batchId), name: a.name, retention_rule: "7 years after filing", approved_by: "Oluwaseun Hartley", matter: "AQ-2026-0101" });
    expect(certificateCsv(cert)).toContain(RETENTION_CAUTION);

    const pdf = await certificatePdf(cert);
    const parser = new PDFParse({ data: new Uint8Array(pdf) });
    const text = (await parser.getText()).text.replace(/\s+/g, " ");
    await parser.destroy();
    expect(text).toContain("Certificate of disposal");
    expect(text).toContain(a.name);
    expect(text).toContain("Confirm them against your jurisdiction's rules");
    expect(text.split("Documents kept")[0]).not.toContain(b.name);
  });

  it("a second approval changes nothing; a batch not approved has no certificate", async () => {
    await expect(approveBatch(admin2, batchId)).rejects.toEqual(error(409, "already_decided"));
    const c = await pastDue("old-invoice-c");
    const other = await proposeBatch(admin, { documentIds: [c.id], note: "One more" });
    await expect(getCertificate(admin, other)).rejects.toEqual(error(409, "not_executed"));
    await expect(rejectBatch(partner, other, "Keep it one more year for the loan application")).resolves.toMatchObject({ status: "rejected", decidedBy: "Oluwaseun Hartley" });
    expect(await dueIds(admin)).toContain(c.id); // a rejected batch frees its documents
    const again = await proposeBatch(admin, { documentIds: [c.id], note: "Loan done" });
    await expect(approveBatch(admin2, again)).resolves.toMatchObject({ disposed: 1 }); // another admin
    expect(await headObject(c.key)).toBeNull();
  });

  it("a partner not on every matter involved cannot approve; a batch with a restricted matter stays behind the wall", async () => {
    const d = await pastDue("dental-old", "AQ-2026-0123");
    const mixed = await proposeBatch(admin, { documentIds: [d.id], note: "Dental" });
    await expect(approveBatch(partner, mixed)).rejects.toThrow(/You are not on matter AQ-2026-0123/);
    await rejectBatch(admin, mixed, "Proposed by mistake");

    const w = await pastDue("carrier-old", "AQ-2026-0131");
    expect(await dueIds(auditor)).not.toContain(w.id);
    expect(await dueIds(partner)).toContain(w.id);
    const walledBatch = await proposeBatch(admin, { documentIds: [w.id], note: "Carrier invoices" });
    for (const outsider of [auditor, clerk]) {
      expect((await listBatches(outsider, { page: 1, pageSize: 200 })).items.map((x) => x.id)).not.toContain(walledBatch);
      await expect(getBatch(outsider, walledBatch)).rejects.toEqual(error(403, "restricted_matter"));
    }
    await approveBatch(partner, walledBatch);
    await expect(getCertificate(auditor, walledBatch)).rejects.toEqual(error(403, "restricted_matter"));
    expect((await getCertificate(partner, walledBatch)).destroyed.map((i) => i.documentId)).toEqual([w.id]);
  });

  it("Cabinets filters past due and due within 90 days, and a tombstone is in neither", async () => {
    const past = (await listDocuments(partner, { filed: true, retention: "past_due", page: 1, pageSize: 200 })).items;
    expect(past.every((d) => d.retention.dueOn !== null && d.disposedAt === null)).toBe(true);
    expect(past.map((d) => d.id)).not.toContain(a.id);
    const soon = await insertStoredFiledDocument(owner, { matterNumber: "AQ-2026-0101", typeName: "Invoices & receipts", filedAt: new Date(Date.now() - (7 * 365 + 1) * 86_400_000 + 30 * 86_400_000), label: "due-soon" });
    const soonList = (await listDocuments(partner, { filed: true, retention: "due_soon", page: 1, pageSize: 200 })).items;
    expect(soonList.map((d) => d.id)).toContain(soon.id);
    expect(past.map((d) => d.id)).not.toContain(soon.id);
  });
});

describe("after disposal", () => {
  it("the same file uploaded again is kept as a new document, not called a duplicate of the tombstone", async () => {
    const { storeUpload } = await import("@/lib/data/intake");
    const { makeTextPdf } = await import("../helpers/make-files");
    const bytes = new Uint8Array(await makeTextPdf([["Kept again after disposal", String(Date.now())]]));
    const first = await storeUpload(clerk, "kept-again.pdf", bytes);
    expect(first.status).toBe("reading");
    const firstId = (first as { id: number }).id;
    await owner("documents").where({ id: firstId }).update({ disposed_at: new Date() }); // as a disposal leaves it
    const again = await storeUpload(clerk, "kept-again.pdf", bytes);
    expect(again).toMatchObject({ status: "reading", httpStatus: 201 });
    expect((again as { id: number }).id).not.toBe(firstId);
    expect(await storeUpload(clerk, "kept-again.pdf", bytes)).toMatchObject({ status: "duplicate" }); // a live copy is
  });
});

describe("a hold racing an approval", () => {
  it("never ends with a document both under a hold and destroyed", async () => {
    const ROUNDS = 6; // each round races one hold against one approval on a fresh batch
    for (let round = 0; round < ROUNDS; round++) {
      const [x, y] = [await pastDue(`race-x-${round}`), await pastDue(`race-y-${round}`)];
      const batch = await proposeBatch(admin, { documentIds: [x.id, y.id], note: `Race ${round}` });
      const [hold, approval] = await Promise.allSettled([
        placeHold(partner, { documentId: x.id, reason: "Raced hold", reference: `RACE-${round}` }),
        approveBatch(admin2, batch),
      ]);
      expect(approval.status).toBe("fulfilled"); // y is never held, so approval always has work
      const row = await owner("documents").where({ id: x.id }).first("disposed_at");
      if (hold.status === "fulfilled") {
        expect(row.disposed_at).toBeNull(); // the hold came first: x was kept
        expect(await headObject(x.key)).not.toBeNull();
        await releaseHold(partner, hold.value.id, "Race over");
      } else {
        expect(hold.reason).toMatchObject({ status: 409, code: "disposed" }); // the approval came first
        expect(row.disposed_at).not.toBeNull();
      }
    }
  });
});
