import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { makeDocx, makeTextPdf } from "../helpers/make-files";
import { makeElfBytes, makeLyingPart, makePart, makeZeroPart, makeZip, repackDocx } from "../helpers/make-hostile-files";
import { ownerDb } from "../helpers/db";

// An archive import through the real routes and workers of the built app: a zip with three
// folders (one whose name is close to a demo type, one with the same name as one, one unknown),
// a matter folder, a program that is not a document, a DOCX zip bomb, an entry that lies about
// its size, an encrypted entry, a duplicate and a file outside any folder.
const owner = ownerDb();
let admin: Client;
let clerk: Client;
const stamp = Date.now();
const files: Record<string, Uint8Array> = {};

async function json(client: Client, method: string, path: string, body?: unknown) {
  const res = await client.request(method, path, body);
  return { status: res.status, body: await res.json() };
}

async function sendZip(client: Client, name: string, zip: Uint8Array) {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(zip)], { type: "application/zip" }), name);
  return json(client, "POST", "/api/imports", form);
}

async function waitUntilDone(id: number) {
  const deadline = Date.now() + 180_000;
  for (;;) {
    const { body } = await json(admin, "GET", `/api/imports/${id}`);
    if (body.state === "done" || body.state === "failed") return body;
    if (Date.now() > deadline) throw new Error(`import ${id} still ${body.state}: ${JSON.stringify(body.counts)}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

beforeAll(async () => {
  admin = await Client.signedIn("admin@example.com");
  clerk = await Client.signedIn("clerk@example.com");
  const pdf = async (label: string) => makeTextPdf([[`${label} ${stamp}`, "Archive import test page with a few words to read."]]);
  files["Invoices/inv-1.pdf"] = await pdf("Invoice 1 from Harbour Supplies");
  files["Invoices/inv-2.pdf"] = await pdf("Invoice 2 from Harbour Supplies");
  files["Invoices/tool.pdf"] = makeElfBytes();
  files["Correspondence/AQ-2026-0102/letter.docx"] = await makeDocx([`Dear client, ${stamp}`, "Thank you for your letter."]);
  files["Correspondence/AQ-2026-0102/minutes.docx"] = await repackDocx(await makeDocx([`Minutes ${stamp}`]), [await makeZeroPart("word/media/filler.bin", 300)]);
  files["Board packs/pack-1.pdf"] = await pdf("Board pack one");
  files["Board packs/pack-2.pdf"] = await pdf("Board pack two");
  files["Board packs/pack-1 copy.pdf"] = files["Board packs/pack-1.pdf"];
  files["readme.pdf"] = await pdf("Read me");
});
afterAll(async () => {
  await owner.destroy();
});

function archive(): Uint8Array {
  const parts = Object.entries(files).map(([p, bytes]) => makePart(`Alder archive/${p}`, bytes));
  parts.push(makeLyingPart("Alder archive/Board packs/huge.pdf", 5 * 1024 * 1024, 1000));
  parts.push({ ...makePart("Alder archive/Board packs/locked.pdf", files["Board packs/pack-2.pdf"]), encrypted: true });
  parts.push(makePart("__MACOSX/Alder archive/._readme.pdf", new Uint8Array([0, 5, 22, 7])));
  return makeZip(parts);
}

describe("archive import", () => {
  it("refuses what is not a zip, and anyone but an admin", async () => {
    const notZip = await sendZip(admin, "archive.zip", new TextEncoder().encode("not a zip at all"));
    expect(notZip.status).toBe(422);
    expect(notZip.body.error.message).toMatch(/^This file is not a zip archive Foldwright can read/);
    expect((await sendZip(clerk, "a.zip", archive())).status).toBe(403);
  });

  it("proposes a mapping, files what it can as imported, and reports each unusable file", async () => {
    const sent = await sendZip(admin, "Alder archive.zip", archive());
    expect(sent.status).toBe(202);
    const id = sent.body.id as number;
    const proposed = await json(admin, "GET", `/api/imports/${id}`);
    expect(proposed.body.state).toBe("proposed");
    const types = Object.fromEntries((await owner("cabinet_types").select("id", "name")).map((t) => [t.name, t.id]));
    const matter = await owner("matters").where({ number: "AQ-2026-0102" }).first("id");
    const other = await owner("matters").where({ restricted: false }).whereNot({ number: "AQ-2026-0102" }).orderBy("id").first("id", "number");
    const folders = Object.fromEntries(proposed.body.folders.map((f: { name: string }) => [f.name, f]));
    expect(Object.keys(folders)).toEqual(["Board packs", "Correspondence", "Invoices"]);
    expect(folders.Invoices).toMatchObject({ files: 3, type: { kind: "existing", cabinetTypeId: types["Invoices & receipts"], match: "close" } });
    expect(folders.Correspondence).toMatchObject({ files: 2, type: { kind: "existing", cabinetTypeId: types.Correspondence, match: "exact" } });
    expect(folders.Correspondence.matterProposals).toEqual([{ name: "AQ-2026-0102", files: 2, matter: { matterId: matter.id, number: "AQ-2026-0102", match: "exact" } }]);
    expect(folders["Board packs"]).toMatchObject({ files: 5, type: { kind: "new", name: "Board packs" } });
    expect(proposed.body.looseFiles).toBe(1);
    expect(proposed.body.counts).toMatchObject({ total: 11, waiting: 10, skipped: 1 });

    const mapping = {
      folders: [
        { name: "Invoices", action: "existing", cabinetTypeId: types["Invoices & receipts"] },
        { name: "Correspondence", action: "existing", cabinetTypeId: types.Correspondence },
        { name: "Board packs", action: "new", newName: `Board packs ${stamp}` },
      ],
      matters: [{ name: "AQ-2026-0102", matterId: matter.id }],
      defaultMatterId: other.id,
    };
    expect((await json(admin, "POST", `/api/imports/${id}/confirm`, { mapping: { ...mapping, folders: mapping.folders.slice(1) } })).body.error.message).toMatch(/^Say where the folder "Invoices" goes/);
    const confirmed = await json(admin, "POST", `/api/imports/${id}/confirm`, { mapping });
    expect(confirmed.status).toBe(202);
    expect((await json(admin, "POST", `/api/imports/${id}/confirm`, { mapping })).status).toBe(409);

    const done = await waitUntilDone(id);
    expect(done.state).toBe("done");
    const fate = Object.fromEntries(done.files.map((f: { path: string; state: string; code: string | null }) => [f.path, [f.state, f.code]]));
    expect(fate).toEqual({
      "Invoices/inv-1.pdf": ["filed", null],
      "Invoices/inv-2.pdf": ["filed", null],
      "Invoices/tool.pdf": ["rejected", "unsupported_type"],
      "Correspondence/AQ-2026-0102/letter.docx": ["filed", null],
      "Correspondence/AQ-2026-0102/minutes.docx": ["unreadable", "zip_bomb"],
      "Board packs/pack-1.pdf": ["filed", null],
      "Board packs/pack-2.pdf": ["filed", null],
      "Board packs/pack-1 copy.pdf": ["duplicate", "duplicate"],
      "readme.pdf": ["skipped", "top_level"],
      "Board packs/huge.pdf": ["rejected", "zip_bomb"],
      "Board packs/locked.pdf": ["rejected", "encrypted"],
    });
    expect(done.counts).toMatchObject({ total: 11, filed: 5, unreadable: 1, duplicate: 1, rejected: 3, skipped: 1 });
    for (const f of done.files) if (f.state !== "filed") expect(f.message).toMatch(/\.$/); // a sentence each

    // Everything else is filed "imported", in the admin's name, with its event and its wall link.
    const adminId = (await owner("users").where({ email: "admin@example.com" }).first("id")).id;
    const newType = await owner("cabinet_types").where({ name: `Board packs ${stamp}` }).first("id", "retention_trigger");
    expect(newType.retention_trigger).toBe("permanent");
    expect(await owner("setup_events").where({ entity: "cabinet_type", entity_id: newType.id, action: "created", user_id: adminId }).first("id")).toBeTruthy();
    const expected: Record<string, [number, number]> = {
      "Invoices/inv-1.pdf": [types["Invoices & receipts"], other.id],
      "Invoices/inv-2.pdf": [types["Invoices & receipts"], other.id],
      "Correspondence/AQ-2026-0102/letter.docx": [types.Correspondence, matter.id],
      "Board packs/pack-1.pdf": [newType.id, other.id],
      "Board packs/pack-2.pdf": [newType.id, other.id],
    };
    for (const f of done.files.filter((x: { state: string }) => x.state === "filed")) {
      const doc = await owner("documents").where({ id: f.documentId }).first();
      expect([doc.cabinet_type_id, doc.matter_id]).toEqual(expected[f.path]);
      expect(doc).toMatchObject({ status: "ready", filed_how: "imported", filed_by: adminId, uploaded_by: adminId });
      const events = await owner("filing_events").where({ document_id: f.documentId }).select();
      expect(events.map((e) => [e.action, e.user_id, e.to_cabinet_type_id, e.to_matter_id])).toEqual([["imported", adminId, ...expected[f.path]]]);
      expect(events[0].reason).toBe(`Imported from "Alder archive.zip" › ${f.path}`);
      expect(await owner("document_matter_links").where({ document_id: f.documentId }).select("matter_id", "how")).toEqual([{ matter_id: expected[f.path][1], how: "imported" }]);
      const original = await admin.request("GET", `/api/documents/${f.documentId}/original`);
      expect(Buffer.from(await original.arrayBuffer()).equals(Buffer.from(files[f.path]))).toBe(true);
    }
    // The zip bomb is kept, as at Intake, unfiled (To review offers it for filing by hand).
    const bomb = done.files.find((f: { path: string }) => f.path.endsWith("minutes.docx"));
    expect(await owner("documents").where({ id: bomb.documentId }).first("status", "filed_at")).toEqual({ status: "unreadable", filed_at: null });
    // No suggestion was made for what the office had already filed.
    expect(await owner("filing_events").whereIn("document_id", Object.values(done.files).map((f) => (f as { documentId: number | null }).documentId ?? 0)).where({ action: "suggested" }).first("id")).toBeUndefined();
    // A retraining started when the import ended, in the admin's name.
    expect(done.modelVersionId).toBeGreaterThan(0);
    expect(await owner("model_versions").where({ id: done.modelVersionId }).first("trigger", "requested_by")).toEqual({ trigger: "manual", requested_by: adminId });
    // The uploaded zip is gone from the bucket once the import is done.
    expect((await owner("imports").where({ id }).first("storage_key")).storage_key).toBeNull();
  });
});
