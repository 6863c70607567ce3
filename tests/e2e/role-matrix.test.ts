import { beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { listRoutesAndPages } from "./app-files";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";

// Every route handler and page × every role (and signed out) → the expected status.
// DESIGN.md §2 is the source of the expectations. A new route must join MATRIX: the last test
// fails when a route file exists that the matrix does not list.
type Who = "signedOut" | "clerk" | "partner" | "admin" | "auditor";
const WHO: Who[] = ["signedOut", "clerk", "partner", "admin", "auditor"];

interface Row {
  method: string;
  path: string | (() => string);
  file: string; // the route file under app/, to prove coverage
  note?: string;
  body?: unknown;
  expect: Record<Who, number>;
}

const all = (signedIn: number, signedOut: number) =>
  ({ signedOut, clerk: signedIn, partner: signedIn, admin: signedIn, auditor: signedIn }) as Record<Who, number>;
const adminWrite = (adminStatus: number) => ({ signedOut: 401, clerk: 403, partner: 403, admin: adminStatus, auditor: 403 }) as Record<Who, number>;
const page = (allowed: Who[]) =>
  Object.fromEntries(WHO.map((w) => [w, w === "signedOut" ? 307 : allowed.includes(w) ? 200 : 403])) as Record<Who, number>;

const MATRIX: Row[] = [
  { method: "GET", path: "/api/health", file: "api/health/route.ts", expect: all(200, 200) },
  { method: "GET", path: "/api/auth/me", file: "api/auth/me/route.ts", expect: all(200, 401) },
  // A sign-in with a wrong password is a 401 for anyone; it never locks the demo accounts here
  // because it names an address that has no account.
  { method: "POST", path: "/api/auth/sign-in", file: "api/auth/sign-in/route.ts", body: { email: "nobody@example.com", password: "x" }, expect: all(401, 401) },
  { method: "POST", path: "/api/auth/sign-out", file: "api/auth/sign-out/route.ts", expect: all(200, 200) },
  { method: "GET", path: "/api/documents", file: "api/documents/route.ts", expect: all(200, 401) },
  // An upload whose only file is empty: 422 for the roles that may upload, 403 for the others.
  { method: "POST", path: "/api/documents", file: "api/documents/route.ts", body: "empty-file", expect: { signedOut: 401, clerk: 422, partner: 403, admin: 422, auditor: 403 } },
  { method: "GET", path: () => `/api/documents/${fixtures.open}`, file: "api/documents/[id]/route.ts", expect: all(200, 401) },
  { method: "GET", path: () => `/api/documents/${fixtures.open}/original`, file: "api/documents/[id]/original/route.ts", expect: all(200, 401) },
  // The restricted demo matter's team is the partner (and admins see everything).
  { method: "GET", path: () => `/api/documents/${fixtures.walled}`, file: "api/documents/[id]/route.ts", note: "restricted matter", expect: { signedOut: 401, clerk: 404, partner: 200, admin: 200, auditor: 404 } },
  { method: "GET", path: () => `/api/documents/${fixtures.open}/preview?page=1`, file: "api/documents/[id]/preview/route.ts", expect: all(200, 401) },
  { method: "GET", path: () => `/api/documents/${fixtures.walled}/preview?page=1`, file: "api/documents/[id]/preview/route.ts", note: "restricted matter", expect: { signedOut: 401, clerk: 404, partner: 200, admin: 200, auditor: 404 } },
  { method: "GET", path: () => `/api/documents/${fixtures.walled}/original`, file: "api/documents/[id]/original/route.ts", note: "restricted matter", expect: { signedOut: 401, clerk: 404, partner: 200, admin: 200, auditor: 404 } },
  // Filing: a body that names no action is a 422 for the roles that may file.
  { method: "POST", path: () => `/api/documents/${fixtures.open}/filing`, file: "api/documents/[id]/filing/route.ts", body: {}, expect: { signedOut: 401, clerk: 422, partner: 422, admin: 422, auditor: 403 } },
  { method: "GET", path: "/api/review", file: "api/review/route.ts", expect: { signedOut: 401, clerk: 200, partner: 200, admin: 200, auditor: 403 } },
  { method: "POST", path: "/api/review/accept", file: "api/review/accept/route.ts", body: { documentIds: [] }, expect: { signedOut: 401, clerk: 422, partner: 422, admin: 422, auditor: 403 } },
  // Undo: an empty list is a 422 for the roles that may file; what an undo does is in tests/integration/undo-move.test.ts.
  { method: "POST", path: "/api/review/undo", file: "api/review/undo/route.ts", body: { eventIds: [] }, expect: { signedOut: 401, clerk: 422, partner: 422, admin: 422, auditor: 403 } },
  { method: "POST", path: () => `/api/documents/${fixtures.open}/filing`, file: "api/documents/[id]/filing/route.ts", note: "undo without an event", body: { action: "undo" }, expect: { signedOut: 401, clerk: 422, partner: 422, admin: 422, auditor: 403 } },
  { method: "GET", path: "/api/filing-events", file: "api/filing-events/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  { method: "GET", path: "/api/filing-events?format=csv", file: "api/filing-events/route.ts", note: "CSV", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  { method: "GET", path: "/api/models", file: "api/models/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  // Retraining: the admin's request queues a run (202); what the run then does is tested elsewhere.
  { method: "POST", path: "/api/models/retrain", file: "api/models/retrain/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 202, auditor: 403 } },
  { method: "POST", path: "/api/models/999999/promote", file: "api/models/[id]/promote/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 404, auditor: 403 } },
  { method: "GET", path: "/api/cabinet-types", file: "api/cabinet-types/route.ts", expect: all(200, 401) },
  { method: "GET", path: "/api/cabinet-types?all=1", file: "api/cabinet-types/route.ts", note: "with retired", expect: all(200, 401) },
  // Setup writes: admins only. A body that fails the schema (or an id that does not exist) shows the
  // admin passed the role check without changing anything the other rows read.
  { method: "POST", path: "/api/cabinet-types", file: "api/cabinet-types/route.ts", body: {}, expect: adminWrite(422) },
  { method: "PATCH", path: "/api/cabinet-types/999999", file: "api/cabinet-types/[id]/route.ts", body: { name: "Matrix probe" }, expect: adminWrite(404) },
  { method: "POST", path: "/api/cabinet-types/999999/merge", file: "api/cabinet-types/[id]/merge/route.ts", body: { intoId: 1 }, expect: adminWrite(404) },
  { method: "GET", path: "/api/clients", file: "api/clients/route.ts", expect: all(200, 401) },
  { method: "POST", path: "/api/clients", file: "api/clients/route.ts", body: {}, expect: adminWrite(422) },
  { method: "PATCH", path: "/api/clients/999999", file: "api/clients/[id]/route.ts", body: { name: "Matrix probe" }, expect: adminWrite(404) },
  { method: "GET", path: "/api/matters", file: "api/matters/route.ts", expect: all(200, 401) },
  { method: "POST", path: "/api/matters", file: "api/matters/route.ts", body: {}, expect: adminWrite(422) },
  { method: "PATCH", path: "/api/matters/999999", file: "api/matters/[id]/route.ts", body: { title: "Matrix probe" }, expect: adminWrite(404) },
  { method: "GET", path: "/api/setup-events", file: "api/setup-events/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  { method: "GET", path: "/api/setup-events?format=csv", file: "api/setup-events/route.ts", note: "CSV", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  { method: "GET", path: "/api/settings", file: "api/settings/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 200 } },
  { method: "PATCH", path: "/api/settings", file: "api/settings/route.ts", body: { autoFileTarget: 0.98 }, expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 403 } },
  // Records (issue 11). Holds: everyone who reads sees them; partners and admins place and lift
  // (a body without a target is a 422; an unknown hold a 404). Disposal: admins propose; partners
  // and admins decide; auditors read; clerks have no part. Impact counts are for Setup (admins).
  { method: "GET", path: "/api/holds", file: "api/holds/route.ts", expect: all(200, 401) },
  { method: "POST", path: "/api/holds", file: "api/holds/route.ts", body: {}, expect: { signedOut: 401, clerk: 403, partner: 422, admin: 422, auditor: 403 } },
  { method: "POST", path: "/api/holds/999999/release", file: "api/holds/[id]/release/route.ts", body: { reason: "Matrix check" }, expect: { signedOut: 401, clerk: 403, partner: 404, admin: 404, auditor: 403 } },
  { method: "GET", path: "/api/disposal/due", file: "api/disposal/due/route.ts", expect: { signedOut: 401, clerk: 403, partner: 200, admin: 200, auditor: 200 } },
  { method: "GET", path: "/api/disposal/batches", file: "api/disposal/batches/route.ts", expect: { signedOut: 401, clerk: 403, partner: 200, admin: 200, auditor: 200 } },
  { method: "POST", path: "/api/disposal/batches", file: "api/disposal/batches/route.ts", body: {}, expect: { signedOut: 401, clerk: 403, partner: 403, admin: 422, auditor: 403 } },
  { method: "POST", path: "/api/disposal/batches/999999/approve", file: "api/disposal/batches/[id]/approve/route.ts", expect: { signedOut: 401, clerk: 403, partner: 404, admin: 404, auditor: 403 } },
  { method: "POST", path: "/api/disposal/batches/999999/reject", file: "api/disposal/batches/[id]/reject/route.ts", body: { reason: "Matrix check" }, expect: { signedOut: 401, clerk: 403, partner: 404, admin: 404, auditor: 403 } },
  { method: "GET", path: "/api/disposal/batches/999999/certificate?format=pdf", file: "api/disposal/batches/[id]/certificate/route.ts", expect: { signedOut: 401, clerk: 403, partner: 404, admin: 404, auditor: 404 } },
  { method: "GET", path: "/api/retention/impact?cabinetTypeId=1&trigger=permanent", file: "api/retention/impact/route.ts", expect: { signedOut: 401, clerk: 403, partner: 403, admin: 200, auditor: 403 } },
  { method: "GET", path: "/holds", file: "(app)/holds/page.tsx", expect: page(["clerk", "partner", "admin", "auditor"]) },
  { method: "GET", path: "/disposal", file: "(app)/disposal/page.tsx", expect: page(["partner", "admin", "auditor"]) },
  { method: "GET", path: "/disposal/batches/999999", file: "(app)/disposal/batches/[id]/page.tsx", note: "no such batch", expect: { signedOut: 307, clerk: 403, partner: 404, admin: 404, auditor: 404 } },
  { method: "GET", path: () => `/documents/${fixtures.open}`, file: "(app)/documents/[id]/page.tsx", expect: page(["clerk", "partner", "admin", "auditor"]) },
  { method: "GET", path: () => `/documents/${fixtures.walled}`, file: "(app)/documents/[id]/page.tsx", note: "restricted matter", expect: { signedOut: 307, clerk: 404, partner: 200, admin: 200, auditor: 404 } },
  { method: "GET", path: "/intake", file: "(app)/intake/page.tsx", expect: page(["clerk", "admin"]) },
  { method: "GET", path: "/review", file: "(app)/review/page.tsx", expect: page(["clerk", "partner", "admin"]) },
  { method: "GET", path: "/cabinets", file: "(app)/cabinets/page.tsx", expect: page(["clerk", "partner", "admin", "auditor"]) },
  { method: "GET", path: "/history", file: "(app)/history/page.tsx", expect: page(["admin", "auditor"]) },
  { method: "GET", path: "/models", file: "(app)/models/page.tsx", expect: page(["admin", "auditor"]) },
  { method: "GET", path: "/setup", file: "(app)/setup/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/setup/cabinet-types", file: "(app)/setup/cabinet-types/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/setup/matters", file: "(app)/setup/matters/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/history/setup", file: "(app)/history/setup/page.tsx", expect: page(["admin", "auditor"]) },
  // People and e-mail (issue 10). Admin-only setup routes answer 404 / 422 for an unknown id or an empty body.
  { method: "GET", path: "/api/users", file: "api/users/route.ts", expect: { ...all(403, 401), admin: 200 } },
  { method: "POST", path: "/api/users", file: "api/users/route.ts", body: {}, expect: { ...all(403, 401), admin: 422 } },
  { method: "PATCH", path: "/api/users/999999", file: "api/users/[id]/route.ts", body: { role: "clerk" }, expect: { ...all(403, 401), admin: 404 } },
  { method: "POST", path: "/api/users/999999/invitation", file: "api/users/[id]/invitation/route.ts", expect: { ...all(403, 401), admin: 404 } },
  // Public on purpose: the one-time link is the credential (an unknown one is a 404 for anyone).
  { method: "POST", path: "/api/auth/accept-invitation", file: "api/auth/accept-invitation/route.ts", body: { token: "x".repeat(40), password: "x" }, expect: all(404, 404) },
  { method: "POST", path: "/api/auth/reset-password", file: "api/auth/reset-password/route.ts", body: { token: "x".repeat(40), password: "x" }, expect: all(404, 404) },
  { method: "POST", path: "/api/auth/forgot-password", file: "api/auth/forgot-password/route.ts", body: { email: "nobody@example.com" }, expect: all(202, 202) },
  { method: "GET", path: "/api/profile/notices", file: "api/profile/notices/route.ts", expect: all(200, 401) },
  { method: "PATCH", path: "/api/profile/notices", file: "api/profile/notices/route.ts", body: {}, expect: all(422, 401) },
  { method: "GET", path: "/api/senders", file: "api/senders/route.ts", expect: { ...all(403, 401), admin: 200 } },
  { method: "POST", path: "/api/senders", file: "api/senders/route.ts", body: {}, expect: { ...all(403, 401), admin: 422 } },
  { method: "DELETE", path: "/api/senders/999999", file: "api/senders/[id]/route.ts", expect: { ...all(403, 401), admin: 404 } },
  { method: "GET", path: "/api/outbox", file: "api/outbox/route.ts", expect: { ...all(403, 401), admin: 200 } },
  // Archive imports (admins): an upload whose only file is empty is not a zip (422).
  { method: "POST", path: "/api/imports", file: "api/imports/route.ts", body: "empty-file", expect: { ...all(403, 401), admin: 422 } },
  { method: "GET", path: "/api/imports/999999", file: "api/imports/[id]/route.ts", expect: { ...all(403, 401), admin: 404 } },
  { method: "POST", path: "/api/imports/999999/confirm", file: "api/imports/[id]/confirm/route.ts", body: {}, expect: { ...all(403, 401), admin: 422 } },
  { method: "GET", path: "/setup/import", file: "(app)/setup/import/page.tsx", expect: page(["admin"]) },
  // Setup's loading.tsx streams the page, so an unknown import shows the not-found page with 200 (the API answers 404).
  { method: "GET", path: "/setup/import/999999", file: "(app)/setup/import/[id]/page.tsx", note: "no such import", expect: page(["admin"]) },
  { method: "GET", path: "/setup/people", file: "(app)/setup/people/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/setup/senders", file: "(app)/setup/senders/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/setup/outbox", file: "(app)/setup/outbox/page.tsx", expect: page(["admin"]) },
  { method: "GET", path: "/profile", file: "(app)/profile/page.tsx", expect: page(["clerk", "partner", "admin", "auditor"]) },
  { method: "GET", path: "/forgot-password", file: "(auth)/forgot-password/page.tsx", expect: all(200, 200) },
  { method: "GET", path: "/invite/not-a-real-token-0000000000000000", file: "(auth)/invite/[token]/page.tsx", expect: all(200, 200) },
  { method: "GET", path: "/reset-password/not-a-real-token-0000000000000000", file: "(auth)/reset-password/[token]/page.tsx", expect: all(200, 200) },
];

const clients = {} as Record<Who, Client>;
const fixtures = { open: 0, walled: 0 };

async function uploadAsAdmin(label: string): Promise<number> {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(await makeTextPdf([[`Matrix fixture ${label} ${Date.now()}`]]))], { type: "application/pdf" }), `${label}.pdf`);
  const res = await clients.admin.request("POST", "/api/documents", form);
  const body = await res.json();
  if (res.status !== 201) throw new Error(`fixture upload answered ${res.status}: ${JSON.stringify(body)}`);
  return body.files[0].id;
}

function bodyFor(row: Row): unknown {
  if (row.body !== "empty-file") return row.body;
  const form = new FormData();
  form.append("file", new Blob([]), "empty.pdf");
  return form;
}

describe("role matrix", () => {
  beforeAll(async () => {
    clients.signedOut = new Client();
    for (const role of ["clerk", "partner", "admin", "auditor"] as const) clients[role] = await Client.signedIn(`${role}@example.com`);
    fixtures.open = await uploadAsAdmin("open");
    fixtures.walled = await uploadAsAdmin("walled");
    const owner = ownerDb();
    const matter = await owner("matters").where({ restricted: true }).first("id");
    await owner("documents").where({ id: fixtures.walled }).update({ matter_id: matter.id });
    await owner.destroy();
  });

  for (const row of MATRIX) {
    const label = typeof row.path === "string" ? row.path : row.path().replace(/\d+/, "{id}");
    it(`${row.method} ${label}${row.note ? ` (${row.note})` : ""}${row.body === "empty-file" ? " (empty file)" : ""}`, async () => {
      const got: Record<string, number> = {};
      const path = typeof row.path === "string" ? row.path : row.path();
      for (const who of WHO) {
        got[who] = (await clients[who].request(row.method, path, bodyFor(row))).status;
        // Sign-out ends every session of that user: sign in again for the rows after it.
        if (row.path === "/api/auth/sign-out" && who !== "signedOut") clients[who] = await Client.signedIn(`${who}@example.com`);
      }
      expect(got).toEqual(row.expect);
    });
  }

  it("lists every route handler and page that exists", () => {
    const found = listRoutesAndPages();
    const exempt = ["(auth)/sign-in/page.tsx", "(app)/page.tsx"]; // public sign-in; home only redirects
    const listed = new Set(MATRIX.map((r) => r.file));
    expect(found.filter((f) => !listed.has(f) && !exempt.includes(f)).sort()).toEqual([]);
  });
});
