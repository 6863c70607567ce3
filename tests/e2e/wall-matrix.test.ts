import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Knex } from "knex";
import { Client, DEMO_PASSWORD } from "./http";
import { listRoutesAndPages, servesGet } from "./app-files";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { fileDocument } from "@/lib/data/filing";
import { saveSuggestion } from "@/lib/data/suggestions";
import { putObject } from "@/storage/s3";

// The ethical wall (DESIGN.md §2: a restricted matter is visible only to its team and admins,
// "in every list, search result, count, download and export"), checked on every read surface ×
// every kind of person × every way a document can be linked to the restricted matter. The last
// test fails when a page or a GET route exists that this matrix neither reads nor exempts.
type Kind = "filed" | "suggested" | "candidate" | "movedOut";
type Who = "team" | "admin" | "outsideClerk" | "outsidePartner" | "outsideAuditor";
const KINDS: Kind[] = ["filed", "suggested", "candidate", "movedOut"];
const INSIDE: Who[] = ["team", "admin"];
const OUTSIDE: Who[] = ["outsideClerk", "outsidePartner", "outsideAuditor"];

const RESTRICTED = { number: "AQ-2026-0131", client: "Ravelston Freight" }; // db/demo/office.ts
const OPEN_MATTER = "AQ-2026-0101";
const run = crypto.randomBytes(4).toString("hex");
/** A fixture document: its name carries `marker`; its text alone carries `word` (what searches ask for). */
interface Fixture {
  id: number;
  marker: string;
  word: string;
  bytes: Uint8Array;
}
const fx = { restrictedId: 0, openId: 0, typeId: 0, docs: {} as Record<Kind, Fixture> };
const clients = {} as Record<Who, Client>;
const roleOf: Record<Who, string> = { team: "partner", admin: "admin", outsideClerk: "clerk", outsidePartner: "partner", outsideAuditor: "auditor" };

interface Surface {
  name: string;
  file: string; // the page or route file under app/
  path: (doc: Fixture) => string;
  /** Roles that may use the surface at all (the others get 401/403, which shows nothing). */
  roles: string[];
  /** Kinds an insider must find here: the positive control that makes the outsider check mean something. */
  shows: Kind[];
  /** Structured look at a JSON answer: does it carry this document? */
  carries?: (json: unknown, id: number) => boolean;
  /** One document's own address: insiders get 200, outsiders 404 as if it did not exist. */
  own?: true;
}

const listCarries = (json: unknown, id: number) => ((json as { items?: { id: number }[] }).items ?? []).some((i) => i.id === id);
const eventsCarry = (json: unknown, id: number) => ((json as { items?: { documentId: number }[] }).items ?? []).some((i) => i.documentId === id);
const ALL_READERS = ["clerk", "partner", "admin", "auditor"];
const DECIDERS = ["clerk", "partner", "admin"];
const AUDIT = ["admin", "auditor"];

const SURFACES: Surface[] = [
  { name: "document list", file: "api/documents/route.ts", path: () => "/api/documents?pageSize=200", roles: ALL_READERS, shows: KINDS, carries: listCarries },
  { name: "full-text search", file: "api/documents/route.ts", path: (d) => `/api/documents?q=${d.word}`, roles: ALL_READERS, shows: KINDS, carries: listCarries },
  { name: "filed list", file: "api/documents/route.ts", path: () => "/api/documents?filed=1&pageSize=200", roles: ALL_READERS, shows: ["filed", "movedOut"], carries: listCarries },
  { name: "list by matter", file: "api/documents/route.ts", path: () => `/api/documents?matter=${fx.restrictedId}&pageSize=200`, roles: ALL_READERS, shows: ["filed"], carries: listCarries },
  { name: "list by ids", file: "api/documents/route.ts", path: (d) => `/api/documents?ids=${d.id}&status=ready`, roles: ALL_READERS, shows: KINDS, carries: listCarries },
  { name: "document", file: "api/documents/[id]/route.ts", path: (d) => `/api/documents/${d.id}`, roles: ALL_READERS, shows: KINDS, own: true },
  { name: "original", file: "api/documents/[id]/original/route.ts", path: (d) => `/api/documents/${d.id}/original`, roles: ALL_READERS, shows: KINDS, own: true },
  { name: "page preview", file: "api/documents/[id]/preview/route.ts", path: (d) => `/api/documents/${d.id}/preview?page=1`, roles: ALL_READERS, shows: KINDS, own: true },
  { name: "document page", file: "(app)/documents/[id]/page.tsx", path: (d) => `/documents/${d.id}`, roles: ALL_READERS, shows: KINDS, own: true },
  { name: "To review queue", file: "api/review/route.ts", path: () => "/api/review?list=review&pageSize=200", roles: DECIDERS, shows: ["suggested", "candidate"], carries: listCarries },
  { name: "To review search", file: "api/review/route.ts", path: (d) => `/api/review?list=review&q=${d.word}`, roles: DECIDERS, shows: ["suggested", "candidate"], carries: listCarries },
  { name: "spot-check list", file: "api/review/route.ts", path: () => "/api/review?list=spot-check&pageSize=200", roles: DECIDERS, shows: [], carries: listCarries },
  { name: "filing record", file: "api/filing-events/route.ts", path: () => "/api/filing-events?pageSize=200", roles: AUDIT, shows: KINDS, carries: eventsCarry },
  { name: "record of one document", file: "api/filing-events/route.ts", path: (d) => `/api/filing-events?document=${d.id}`, roles: AUDIT, shows: KINDS, carries: eventsCarry },
  { name: "record as CSV", file: "api/filing-events/route.ts", path: () => "/api/filing-events?format=csv", roles: AUDIT, shows: KINDS },
  { name: "History page", file: "(app)/history/page.tsx", path: () => "/history", roles: AUDIT, shows: KINDS },
  { name: "Cabinets page", file: "(app)/cabinets/page.tsx", path: () => "/cabinets", roles: ALL_READERS, shows: ["filed"] },
  { name: "Cabinets search", file: "(app)/cabinets/page.tsx", path: (d) => `/cabinets?q=${d.word}`, roles: ALL_READERS, shows: ["filed", "movedOut"] },
  { name: "Cabinets of the matter", file: "(app)/cabinets/page.tsx", path: () => `/cabinets?matter=${fx.restrictedId}`, roles: ALL_READERS, shows: ["filed"] },
  { name: "matter picker", file: "api/matters/route.ts", path: () => "/api/matters", roles: ALL_READERS, shows: [] },
  { name: "To review page", file: "(app)/review/page.tsx", path: () => "/review", roles: DECIDERS, shows: [] },
  { name: "holds list", file: "api/holds/route.ts", path: () => "/api/holds", roles: ALL_READERS, shows: ["filed"] },
  { name: "Holds page", file: "(app)/holds/page.tsx", path: () => "/holds", roles: ALL_READERS, shows: ["filed"] },
  { name: "disposal due list", file: "api/disposal/due/route.ts", path: () => "/api/disposal/due?pageSize=200", roles: ["partner", "admin", "auditor"], shows: [] },
  { name: "disposal batches", file: "api/disposal/batches/route.ts", path: () => "/api/disposal/batches", roles: ["partner", "admin", "auditor"], shows: [] },
  { name: "Disposal page", file: "(app)/disposal/page.tsx", path: () => "/disposal", roles: ["partner", "admin", "auditor"], shows: [] },
  { name: "client list", file: "api/clients/route.ts", path: () => "/api/clients", roles: ALL_READERS, shows: [] },
  { name: "setup record", file: "api/setup-events/route.ts", path: () => "/api/setup-events?pageSize=200", roles: AUDIT, shows: [] },
  { name: "setup record as CSV", file: "api/setup-events/route.ts", path: () => "/api/setup-events?format=csv", roles: AUDIT, shows: [] },
  { name: "setup record page", file: "(app)/history/setup/page.tsx", path: () => "/history/setup", roles: AUDIT, shows: [] },
  { name: "Setup: clients & matters", file: "(app)/setup/matters/page.tsx", path: () => "/setup/matters", roles: ["admin"], shows: [] },
];

/** Pages and GET routes that carry nothing of any document or matter, with the reason. */
const EXEMPT: Record<string, string> = {
  "(app)/page.tsx": "redirects to the first area",
  "(auth)/sign-in/page.tsx": "public sign-in form",
  "(app)/intake/page.tsx": "the page is a drop zone; its list comes from GET /api/documents?mine=1 (checked below)",
  "(app)/models/page.tsx": "office-wide model figures per cabinet type; no matter, document or name",
  "(app)/setup/page.tsx": "setup index",
  "(app)/setup/cabinet-types/page.tsx": "cabinet types hold no matter or document (admins only)",
  "api/health/route.ts": "database and storage status only",
  "api/auth/me/route.ts": "the signed-in person only",
  "api/cabinet-types/route.ts": "cabinet types hold no matter or document",
  "api/models/route.ts": "office-wide model figures per cabinet type",
  "api/settings/route.ts": "the auto-file policy",
  "api/users/route.ts": "people and roles (admins only)",
  "api/profile/notices/route.ts": "the signed-in person's own notice switches",
  "api/senders/route.ts": "allowed e-mail senders (admins only)",
  "api/outbox/route.ts": "mail sent, for admins only, who are inside every wall",
  "api/imports/[id]/route.ts": "an archive import, for admins only, who are inside every wall",
  "(app)/setup/import/page.tsx": "archive imports, for admins only, who are inside every wall",
  "(app)/setup/import/[id]/page.tsx": "an archive import, for admins only, who are inside every wall",
  "(app)/setup/people/page.tsx": "people and roles (admins only)",
  "(app)/setup/senders/page.tsx": "allowed e-mail senders (admins only)",
  "(app)/setup/outbox/page.tsx": "mail sent, for admins only, who are inside every wall",
  "(app)/profile/page.tsx": "the signed-in person's own settings",
  "(auth)/forgot-password/page.tsx": "public form",
  "api/retention/impact/route.ts": "counts for a rule change, admins only (inside every wall)",
  "(app)/disposal/batches/[id]/page.tsx": "one batch; its wall is checked by tests/integration/records.test.ts and tests/e2e/records-http.test.ts",
  "api/disposal/batches/[id]/certificate/route.ts": "one batch's certificate; its wall is checked by tests/e2e/records-http.test.ts",
  "(auth)/invite/[token]/page.tsx": "public form behind a one-time link",
  "(auth)/reset-password/[token]/page.tsx": "public form behind a one-time link",
};

/** Anything in a text answer that gives the document or the restricted matter away. */
function leaks(text: string, doc: Fixture): string | null {
  for (const mark of [doc.marker, RESTRICTED.number, RESTRICTED.client]) if (text.includes(mark)) return mark;
  return null;
}

async function look(who: Who, s: Surface, doc: Fixture) {
  const res = await clients[who].request("GET", s.path(doc));
  const text = await res.text();
  let json: unknown = null;
  if ((res.headers.get("content-type") ?? "").includes("json")) json = JSON.parse(text);
  return { status: res.status, text, json };
}

async function addOutsidePartner(db: Knex): Promise<void> {
  const email = `outside-partner-${run}@example.com`;
  await db("users").insert({ email, name: `Outside Partner ${run}`, role: "partner", password_hash: await bcrypt.hash(DEMO_PASSWORD, 4) });
  clients.outsidePartner = await Client.signedIn(email);
}

/** A read document uploaded by the admin, with a unique word in its name and text, and its original in the bucket. */
async function addDocument(db: Knex, label: string, uploaderId: number): Promise<Fixture> {
  const marker = `zqwall${label.toLowerCase()}${run}`;
  const word = `zqword${label.toLowerCase()}${run}`;
  const text = `Notice ${word}. Freight carrier dispute papers for the file.`;
  const bytes = await makeTextPdf([[text]]);
  const key = `test/wall/${run}/${label}`;
  await putObject(key, Buffer.from(bytes), { contentType: "application/pdf" });
  const [id] = await db("documents").insert({
    sha256: crypto.createHash("sha256").update(bytes).digest("hex"),
    original_name: `${marker}.pdf`, media_type: "application/pdf", size_bytes: bytes.byteLength, storage_key: key,
    status: "ready", text, page_count: 1, char_count: text.length, uploaded_by: uploaderId, read_at: new Date(),
  });
  return { id, marker, word, bytes };
}

const suggestion = (documentId: number, topMatterId: number, candidates: number[]) => ({
  documentId, modelVersionId: null, method: "cold_start" as const,
  ranked: [{ cabinetTypeId: fx.typeId, confidence: 0.9, probability: null, source: "description" as const }],
  noConfidentMatch: false, modelConfidence: null, why: [],
  matterCandidates: candidates.map((matterId, i) => ({ matterId, score: 0.9 - i / 10, reasons: ["test"] })),
  topMatterId, matterAmbiguous: candidates.length > 1, autoFile: false,
});

describe("ethical wall matrix", () => {
  let db: Knex;
  beforeAll(async () => {
    db = ownerDb();
    for (const who of ["team", "admin", "outsideClerk", "outsideAuditor"] as const) clients[who] = await Client.signedIn(`${roleOf[who]}@example.com`);
    await addOutsidePartner(db);
    fx.restrictedId = (await db("matters").where({ number: RESTRICTED.number }).first("id")).id;
    fx.openId = (await db("matters").where({ number: OPEN_MATTER }).first("id")).id;
    fx.typeId = (await db("cabinet_types").where({ active: true }).orderBy("id").first("id")).id;
    const admin = await demoUser("admin@example.com");
    for (const kind of KINDS) fx.docs[kind] = await addDocument(db, kind, admin.id);
    // Each link is made the way the product makes it (the Data Access Layer as the admin).
    await fileDocument(admin, fx.docs.filed.id, { action: "file", cabinetTypeId: fx.typeId, matterId: fx.restrictedId });
    await saveSuggestion(null, null, suggestion(fx.docs.suggested.id, fx.restrictedId, [fx.restrictedId]));
    await saveSuggestion(null, null, suggestion(fx.docs.candidate.id, fx.openId, [fx.openId, fx.restrictedId]));
    await fileDocument(admin, fx.docs.movedOut.id, { action: "file", cabinetTypeId: fx.typeId, matterId: fx.restrictedId });
    await fileDocument(admin, fx.docs.movedOut.id, { action: "move", matterId: fx.openId, reason: "filed in the wrong matter" });
    // A legal hold on the filed one, placed the way a person places it.
    const hold = await clients.admin.request("POST", "/api/holds", { documentId: fx.docs.filed.id, reason: "Wall check", reference: `WALL-${run}` });
    if (hold.status !== 201) throw new Error(`placing the fixture hold answered ${hold.status}: ${await hold.text()}`);
  });
  afterAll(() => db.destroy());

  for (const s of SURFACES) {
    for (const kind of KINDS) {
      it(`${s.name} · ${kind}: insiders see it, outsiders get nothing`, async () => {
        const doc = fx.docs[kind];
        for (const who of INSIDE) {
          if (!s.roles.includes(roleOf[who])) continue;
          const got = await look(who, s, doc);
          expect(got.status, `${who} on ${s.name}`).toBe(200);
          if (s.shows.includes(kind)) {
            const found = s.own ? got.status === 200 : s.carries && got.json ? s.carries(got.json, doc.id) : leaks(got.text, doc) !== null;
            expect(found, `${who} should find the ${kind} document on ${s.name}`).toBe(true);
          }
        }
        for (const who of OUTSIDE) {
          const got = await look(who, s, doc);
          // Allowed to use the surface: 200 with nothing of the document (or 404 for its own address).
          if (s.roles.includes(roleOf[who])) expect(got.status, `${who} on ${s.name}`).toBe(s.own ? 404 : 200);
          expect(leaks(got.text, doc), `${who} on ${s.name} (status ${got.status})`).toBeNull();
          if (s.carries && got.json) expect(s.carries(got.json, doc.id), `${who} on ${s.name}`).toBe(false);
        }
      });
    }
  }

  it("the matter picker names the restricted matter to its team and admins only", async () => {
    for (const who of [...INSIDE, ...OUTSIDE]) {
      const { json } = await look(who, SURFACES.find((s) => s.name === "matter picker")!, { id: 0, marker: "-", word: "-", bytes: new Uint8Array() });
      const numbers = (json as { items: { number: string }[] }).items.map((m) => m.number);
      expect(numbers.includes(RESTRICTED.number), who).toBe(INSIDE.includes(who));
    }
  });

  it("a duplicate upload of a walled document tells an outsider only that it is held", async () => {
    for (const kind of KINDS) {
      const form = new FormData();
      form.append("file", new Blob([new Uint8Array(fx.docs[kind].bytes)], { type: "application/pdf" }), "again.pdf");
      const res = await clients.outsideClerk.request("POST", "/api/documents", form);
      const text = await res.text();
      expect(res.status).toBe(200);
      const file = JSON.parse(text).files[0];
      expect(file).toMatchObject({ status: "duplicate", duplicateOf: { id: null } });
      expect(file.duplicateOf.message).toMatch(/restricted — ask the matter's team/i);
      expect(leaks(text, fx.docs[kind])).toBeNull();
      expect(text).not.toContain(`#${fx.docs[kind].id}`);
    }
    // The team still learns where the earlier copy is.
    const form = new FormData();
    form.append("file", new Blob([new Uint8Array(fx.docs.filed.bytes)], { type: "application/pdf" }), "again.pdf");
    const mine = await (await clients.admin.request("POST", "/api/documents", form)).json();
    expect(mine.files[0].duplicateOf.id).toBe(fx.docs.filed.id);
  });

  it("the uploader's own Intake list keeps a walled upload as its name and 'restricted' only", async () => {
    const clerk = await demoUser("clerk@example.com");
    const own = await addDocument(db, "ownupload", clerk.id);
    const id = own.id;
    await saveSuggestion(null, null, suggestion(id, fx.restrictedId, [fx.restrictedId]));
    const list = await (await clients.outsideClerk.request("GET", "/api/documents?mine=1&pageSize=200")).json();
    const stub = list.items.find((i: { id: number }) => i.id === id);
    expect(stub).toMatchObject({ name: `${own.marker}.pdf`, restricted: true, matter: null, cabinetType: null, mediaType: "" });
    expect(JSON.stringify(stub)).not.toMatch(/AQ-2026-0131|Ravelston|Freight/);
    expect((await clients.outsideClerk.request("GET", `/api/documents/${id}`)).status).toBe(404);
    // …and a search over the words read never finds it through the uploader's list.
    const search = await (await clients.outsideClerk.request("GET", `/api/documents?mine=1&q=${own.word}`)).json();
    expect(search.items.some((i: { id: number }) => i.id === id)).toBe(false);
  });

  it("restricting a matter takes effect on an outsider's next request", async () => {
    const admin = await demoUser("admin@example.com");
    // A client of its own: a restricted matter under a demo client would make that client's name in
    // any later test's document a candidate of a walled matter, and hide the document there.
    const [clientId] = await db("clients").insert({ name: `Wall Check Client ${run}`, aliases: "[]", email_domains: "[]" });
    const [otherId] = await db("matters").insert({ client_id: clientId, number: `AQ-WALL-${run}`, title: `Wall check ${run}`, opened_on: "2026-01-05" });
    const late = await addDocument(db, "latewall", admin.id);
    await fileDocument(admin, late.id, { action: "file", cabinetTypeId: fx.typeId, matterId: otherId });
    expect((await clients.outsideClerk.request("GET", `/api/documents/${late.id}`)).status).toBe(200);
    await db("matters").where({ id: otherId }).update({ restricted: true });
    expect((await clients.outsideClerk.request("GET", `/api/documents/${late.id}`)).status).toBe(404);
    expect((await clients.outsideClerk.request("GET", `/api/documents?q=${late.word}`)).status).toBe(200);
    expect((await (await clients.outsideClerk.request("GET", `/api/documents?q=${late.word}`)).json()).total).toBe(0);
  });

  it("reads or exempts every page and GET route that exists", () => {
    const found = listRoutesAndPages().filter((f) => f.endsWith("page.tsx") || servesGet(f));
    const covered = new Set([...SURFACES.map((s) => s.file), ...Object.keys(EXEMPT)]);
    expect(found.filter((f) => !covered.has(f)).sort()).toEqual([]);
  });
});
