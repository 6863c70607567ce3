import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { closeDb } from "@/db";
import { canSeeMatter } from "@/lib/data/catalog";
import { createClient, listClients, updateClient } from "@/lib/data/setup-clients";
import { listSetupEvents, streamSetupEventsCsv } from "@/lib/data/setup-events";
import { createMatter, listMatters, updateMatter } from "@/lib/data/setup-matters";
import type { CurrentUser } from "@/lib/data/users";
import { clientSchema } from "@/lib/validations/setup";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";

// Clients, matters and teams through the Data Access Layer against the real MariaDB: the
// refusals of bad input, every change on the setup record, and the wall following a change.
const owner = ownerDb();
const who = {} as Record<"admin" | "clerk" | "partner" | "auditor", CurrentUser>;
const unique = () => `${Date.now()}-${Math.floor(Math.random() * 1e6)}`;

beforeAll(async () => {
  for (const role of ["admin", "clerk", "partner", "auditor"] as const) who[role] = await demoUser(`${role}@example.com`);
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

const newClient = (extra: Partial<Parameters<typeof createClient>[1]> = {}) =>
  createClient(who.admin, clientSchema.parse({ name: `Heron Boatworks ${unique()}`, aliases: ["Heron"], emailDomains: ["heron.example"], taxIdLast4: "4821", ...extra }));
const matterInput = (clientId: number, extra: Record<string, unknown> = {}) => ({
  clientId,
  number: `HB-${unique()}`,
  title: "Yard lease renewal",
  restricted: false,
  team: [] as number[],
  openedOn: "2026-03-02",
  closedOn: null,
  status: "open" as const,
  ...extra,
});

describe("clients", () => {
  it("creates a client on the record and keeps only the last four digits of a tax ID", async () => {
    const c = await newClient();
    expect(c.taxIdLast4).toBe("4821");
    expect(await owner("setup_events").where({ entity: "client", entity_id: c.id }).first("action", "after")).toMatchObject({ action: "created", after: { name: c.name, taxIdLast4: "4821" } });
    expect(() => clientSchema.parse({ name: "X", taxIdLast4: "12-3456789" })).toThrow(/only the last four digits/);
  });

  it("refuses a duplicate client name with a 409 and records a rename with both names", async () => {
    const c = await newClient();
    await expect(createClient(who.admin, clientSchema.parse({ name: c.name }))).rejects.toMatchObject({ status: 409, message: expect.stringContaining(c.name) });
    const renamed = await updateClient(who.admin, c.id, { name: `${c.name} Ltd` });
    const e = await owner("setup_events").where({ entity: "client", entity_id: c.id }).orderBy("id", "desc").first();
    expect(e).toMatchObject({ action: "renamed", before: { name: c.name }, after: { name: renamed.name } });
  });
});

describe("matters and teams", () => {
  it("refuses an unknown client, a team member who does not exist, and a duplicate number naming its holder", async () => {
    const c = await newClient();
    await expect(createMatter(who.admin, matterInput(999_999))).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/client does not exist/) });
    await expect(createMatter(who.admin, matterInput(c.id, { team: [who.partner.id, 999_999] }))).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/No person with id 999999/) });
    const m = await createMatter(who.admin, matterInput(c.id, { title: "Slipway dispute" }));
    await expect(createMatter(who.admin, matterInput(c.id, { number: m.number }))).rejects.toMatchObject({
      status: 409,
      message: `Matter number ${m.number} is already used by "Slipway dispute" for ${c.name}. Matter numbers are unique: choose another number.`,
    });
  });

  it("asks for the date when closing, clears it on reopening, and records both", async () => {
    const c = await newClient();
    const m = await createMatter(who.admin, matterInput(c.id));
    await expect(updateMatter(who.admin, m.id, { status: "closed" })).rejects.toBeInstanceOf(ZodError);
    await expect(updateMatter(who.admin, m.id, { status: "closed", closedOn: "2026-01-01" })).rejects.toThrow(/before the opened date/);
    expect(await updateMatter(who.admin, m.id, { status: "closed", closedOn: "2026-11-30" })).toMatchObject({ status: "closed", closedOn: "2026-11-30" });
    expect(await updateMatter(who.admin, m.id, { status: "open" })).toMatchObject({ status: "open", closedOn: null });
    const actions = await owner("setup_events").where({ entity: "matter", entity_id: m.id }).orderBy("id").pluck("action");
    expect(actions).toEqual(["created", "closed", "reopened"]);
  });

  it("restricting a matter and removing someone from its team reach the wall at once, each on the record", async () => {
    const c = await newClient();
    const m = await createMatter(who.admin, matterInput(c.id, { team: [who.partner.id, who.clerk.id] }));
    expect(await canSeeMatter(who.auditor, m.id)).toBe(true);
    await updateMatter(who.admin, m.id, { restricted: true });
    expect(await canSeeMatter(who.auditor, m.id)).toBe(false);
    expect((await listMatters(who.auditor, { page: 1, pageSize: 1000 })).items.map((x) => x.id)).not.toContain(m.id);
    expect(await canSeeMatter(who.clerk, m.id)).toBe(true);
    await updateMatter(who.admin, m.id, { team: [who.partner.id] });
    expect(await canSeeMatter(who.clerk, m.id)).toBe(false);
    expect(await canSeeMatter(who.partner, m.id)).toBe(true);
    const events = await owner("setup_events").whereIn("entity", ["matter", "team"]).where({ entity_id: m.id }).orderBy("id").select("entity", "action", "after");
    expect(events.map((e) => `${e.entity}:${e.action}`)).toEqual(["matter:created", "team:member_added", "team:member_added", "matter:restricted", "team:member_removed"]);
    // One step per event: the team as it stood after each change.
    expect(events.slice(1, 3).map((e) => e.after.team.length)).toEqual([1, 2]);
    expect(events[4].after.team).toEqual([who.partner.name]);
  });

  it("lets someone who can no longer sign in stay on a team (so the matter can still be edited), never join one", async () => {
    const c = await newClient();
    const [leaver] = await owner("users").insert({ email: `leaver-${unique()}@example.com`, name: "Former Clerk", role: "clerk", password_hash: "x" });
    const m = await createMatter(who.admin, matterInput(c.id, { team: [leaver] }));
    await owner("users").where({ id: leaver }).update({ active: false });
    expect(await updateMatter(who.admin, m.id, { title: "Renamed while a leaver is on it" })).toMatchObject({ title: "Renamed while a leaver is on it" });
    const other = await createMatter(who.admin, matterInput(c.id));
    await expect(updateMatter(who.admin, other.id, { team: [leaver] })).rejects.toMatchObject({ status: 422, message: "Former Clerk can no longer sign in. Leave them off the team, or ask an admin to reactivate them." });
    expect((await updateMatter(who.admin, m.id, { team: [] })).team).toEqual([]);
  });

  it("keeps a client whose only matter is walled off out of an outsider's client list, and its events out of their record", async () => {
    const c = await newClient();
    const m = await createMatter(who.admin, matterInput(c.id, { restricted: true, team: [who.partner.id] }));
    expect((await listClients(who.clerk)).map((x) => x.id)).not.toContain(c.id);
    expect((await listClients(who.partner)).find((x) => x.id === c.id)?.matterCount).toBe(1);
    const seen = async (u: CurrentUser) => (await listSetupEvents(u, { page: 1, pageSize: 10_000 })).items.filter((e) => (e.entity === "client" && e.entityId === c.id) || (["matter", "team"].includes(e.entity) && e.entityId === m.id)).length;
    expect(await seen(who.admin)).toBe(3); // client created, matter created, partner added
    expect(await seen(who.auditor)).toBe(0);
  });

  it("exports the setup record as CSV, quoted by RFC 4180", async () => {
    const c = await newClient({ name: `=HYPERLINK("x") ${unique()}`, aliases: ['Say "hi", then go'] });
    const text = await new Response(streamSetupEventsCsv(who.admin, { entity: "client", entityId: c.id, limit: 10 })).text();
    const [head, row] = text.split("\r\n");
    expect(head).toBe("id,at,user,entity,entity_id,action,before,after,reason");
    expect(row).toContain(",client,");
    // The JSON cell holds quotes and commas: quoted, with quotes doubled (RFC 4180 §2.5–2.7).
    expect(row).toContain('"{""name"":""=HYPERLINK(\\""x\\"")');
    expect(text.endsWith("\r\n")).toBe(true);
  });
});
