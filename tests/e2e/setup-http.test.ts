import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";

// Setup through the real routes of a production build: the refusals (422/409 with a sentence),
// the wall following a change on the outsider's next request (same session, no sign-in again),
// and the setup record's CSV.
const owner = ownerDb();
const as = {} as Record<"admin" | "clerk" | "partner" | "auditor", Client>;
const stamp = `${Date.now()}`;
const createdTypes: number[] = [];
const typeBody = (extra: Record<string, unknown> = {}) => ({ name: `HTTP probe ${stamp}`, description: "Papers for the HTTP test.", keywords: ["probe"], retentionYears: 5, retentionTrigger: "after_filing", retentionSource: "common practice", ...extra });

async function json(res: Response) {
  return { status: res.status, body: await res.json() };
}
const ids = async (c: Client, path: string) => ((await (await c.request("GET", path)).json()).items as { id: number }[]).map((x) => x.id);

beforeAll(async () => {
  for (const role of ["admin", "clerk", "partner", "auditor"] as const) as[role] = await Client.signedIn(`${role}@example.com`);
});
afterAll(async () => {
  // The record is append-only, so the test's types are retired rather than removed: they leave the pickers of later tests.
  for (const id of createdTypes) await as.admin.request("PATCH", `/api/cabinet-types/${id}`, { active: false });
  await owner.destroy();
});

describe("setup refusals through the routes", () => {
  it("cabinet types: an empty name, a bad retention pair and a duplicate name each get 422/409 with a sentence", async () => {
    expect(await json(await as.admin.request("POST", "/api/cabinet-types", typeBody({ name: "  " })))).toEqual({ status: 422, body: { error: { code: "bad_input", message: "name: Give the cabinet type a name." } } });
    const permanentWithYears = await json(await as.admin.request("POST", "/api/cabinet-types", typeBody({ retentionTrigger: "permanent", retentionYears: 10 })));
    expect(permanentWithYears).toMatchObject({ status: 422, body: { error: { message: expect.stringMatching(/^retentionYears: A permanent type keeps documents for good/) } } });
    const created = await json(await as.admin.request("POST", "/api/cabinet-types", typeBody()));
    expect(created).toMatchObject({ status: 201, body: { name: `HTTP probe ${stamp}`, active: true } });
    createdTypes.push(created.body.id);
    expect(await json(await as.admin.request("POST", "/api/cabinet-types", typeBody()))).toMatchObject({ status: 409, body: { error: { code: "duplicate_name", message: expect.stringContaining("already exists") } } });
    expect((await as.admin.request("POST", "/api/cabinet-types", "not json")).status).toBe(422);
  });

  it("retiring takes a type out of GET /api/cabinet-types; ?all=1 still lists it", async () => {
    const res = await json(await as.admin.request("POST", "/api/cabinet-types", typeBody({ name: `HTTP retire ${stamp}` })));
    createdTypes.push(res.body.id);
    expect((await as.admin.request("PATCH", `/api/cabinet-types/${res.body.id}`, { active: false })).status).toBe(200);
    expect(await ids(as.clerk, "/api/cabinet-types")).not.toContain(res.body.id);
    expect(await ids(as.clerk, "/api/cabinet-types?all=1")).toContain(res.body.id);
  });

  it("clients and matters: a whole tax ID, an unknown client, a team member who does not exist and a duplicate number", async () => {
    expect(await json(await as.admin.request("POST", "/api/clients", { name: `Whole tax ${stamp}`, taxIdLast4: "123456789" }))).toMatchObject({ status: 422, body: { error: { message: expect.stringContaining("only the last four digits") } } });
    const client = (await json(await as.admin.request("POST", "/api/clients", { name: `Refusal Client ${stamp}` }))).body;
    const matter = { clientId: client.id, number: `RF-${stamp}`, title: "Refusals", openedOn: "2026-05-01" };
    expect(await json(await as.admin.request("POST", "/api/matters", { ...matter, clientId: 999_999 }))).toMatchObject({ status: 422, body: { error: { message: expect.stringMatching(/client does not exist/) } } });
    expect(await json(await as.admin.request("POST", "/api/matters", { ...matter, team: [999_999] }))).toMatchObject({ status: 422, body: { error: { message: expect.stringMatching(/No person with id 999999/) } } });
    expect((await as.admin.request("POST", "/api/matters", matter)).status).toBe(201);
    expect(await json(await as.admin.request("POST", "/api/matters", { ...matter, title: "Another" }))).toMatchObject({
      status: 409,
      body: { error: { code: "duplicate_number", message: `Matter number RF-${stamp} is already used by "Refusals" for Refusal Client ${stamp}. Matter numbers are unique: choose another number.` } },
    });
  });
});

describe("the wall follows setup on the next request", () => {
  it("restricting a matter hides it, its client and its documents from a signed-in outsider; removing a team member does too", async () => {
    const client = (await json(await as.admin.request("POST", "/api/clients", { name: `Wall Client ${stamp}` }))).body;
    const matter = (await json(await as.admin.request("POST", "/api/matters", { clientId: client.id, number: `WL-${stamp}`, title: "Wall test", openedOn: "2026-06-01" }))).body;
    const form = new FormData();
    form.append("file", new Blob([new Uint8Array(await makeTextPdf([[`Wall test document ${stamp}`]]))], { type: "application/pdf" }), `wall-${stamp}.pdf`);
    const doc = (await (await as.admin.request("POST", "/api/documents", form)).json()).files[0].id as number;
    await owner("documents").where({ id: doc }).update({ matter_id: matter.id }); // arranged: filed into the matter

    expect(await ids(as.auditor, "/api/matters")).toContain(matter.id);
    expect((await as.auditor.request("GET", `/api/documents/${doc}`)).status).toBe(200);

    expect((await as.admin.request("PATCH", `/api/matters/${matter.id}`, { restricted: true, team: [(await me(as.partner)), (await me(as.clerk))] })).status).toBe(200);
    // The same sessions, the very next request.
    expect(await ids(as.auditor, "/api/matters")).not.toContain(matter.id);
    expect(await ids(as.auditor, "/api/clients")).not.toContain(client.id);
    expect((await as.auditor.request("GET", `/api/documents/${doc}`)).status).toBe(404);
    expect(await ids(as.clerk, "/api/matters")).toContain(matter.id);
    expect((await as.clerk.request("GET", `/api/documents/${doc}`)).status).toBe(200);

    expect((await as.admin.request("PATCH", `/api/matters/${matter.id}`, { team: [await me(as.partner)] })).status).toBe(200);
    expect(await ids(as.clerk, "/api/matters")).not.toContain(matter.id);
    expect((await as.clerk.request("GET", `/api/documents/${doc}`)).status).toBe(404);
    expect(await ids(as.partner, "/api/matters")).toContain(matter.id);

    // The record: the admin's CSV holds the restriction and the removal; the auditor's holds neither.
    const csv = async (c: Client) => (await c.request("GET", `/api/setup-events?entity=team&format=csv&pageSize=10000`)).text();
    const adminCsv = await csv(as.admin);
    expect(adminCsv.split("\r\n")[0]).toBe("id,at,user,entity,entity_id,action,before,after,reason");
    expect(adminCsv).toMatch(new RegExp(`,team,${matter.id},member_removed,`));
    expect(await csv(as.auditor)).not.toMatch(new RegExp(`,team,${matter.id},`));
    const restricted = (await (await as.admin.request("GET", `/api/setup-events?entity=matter&entityId=${matter.id}`)).json()).items.map((e: { action: string }) => e.action);
    expect(restricted).toEqual(["restricted", "created"]);
  });
});

async function me(c: Client): Promise<number> {
  return (await (await c.request("GET", "/api/auth/me")).json()).user.id;
}
