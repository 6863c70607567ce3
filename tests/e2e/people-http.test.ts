import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";
import { ownerDb } from "../helpers/db";
import { linkIn, mailsTo, waitForMail } from "../helpers/mail";

// Invitations, password resets and deactivation through the real routes, with the mail read from
// the real local catcher (the app's mail job sends it over SMTP).
const stamp = Date.now();
const PASSWORD = "quiet harbour lanterns";
let admin: Client;
const owner = ownerDb();

beforeAll(async () => {
  admin = await Client.signedIn("admin@example.com");
});
afterAll(async () => {
  await owner.destroy();
});

async function invite(email: string, role = "clerk") {
  const res = await admin.request("POST", "/api/users", { email, name: `Invited ${role}`, role });
  expect(res.status).toBe(201);
  const { person } = await res.json();
  expect(person.state).toBe("invited");
  return person as { id: number; email: string };
}

async function acceptedPerson(email: string, role = "clerk") {
  const person = await invite(email, role);
  const { token } = linkIn(await waitForMail(email, { subject: "invited" }), "invite");
  expect((await new Client().request("POST", "/api/auth/accept-invitation", { token, password: PASSWORD })).status).toBe(200);
  return person;
}

describe("invitations", () => {
  it("arrive by mail; the link sets a password once; the person then signs in", async () => {
    const email = `invitee-${stamp}@example.com`;
    const person = await invite(email);
    const mail = await waitForMail(email, { subject: "invited" });
    const { url, token } = linkIn(mail, "invite");
    expect(url.endsWith(`/invite/${token}`)).toBe(true);

    // The stored token is a hash, never the token itself.
    const stored = await owner("account_tokens").where({ user_id: person.id, purpose: "invitation" }).first("token_hash");
    expect(stored.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.token_hash).not.toContain(token);

    // Invited, not yet accepted: cannot sign in.
    expect((await new Client().request("POST", "/api/auth/sign-in", { email, password: PASSWORD })).status).toBe(401);

    const visitor = new Client();
    const page = await visitor.request("GET", `/invite/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain(email);

    const weak = await visitor.request("POST", "/api/auth/accept-invitation", { token, password: "password1234" });
    expect(weak.status).toBe(422);
    expect((await weak.json()).error.message).toMatch(/commonly used/);

    const ok = await visitor.request("POST", "/api/auth/accept-invitation", { token, password: PASSWORD });
    expect(ok.status).toBe(200);
    const me = await Client.signedIn(email, PASSWORD);
    const who = await (await me.request("GET", "/api/auth/me")).json();
    expect(who.user.email).toBe(email);

    const again = await visitor.request("POST", "/api/auth/accept-invitation", { token, password: "another fine password" });
    expect(again.status).toBe(410);
    expect((await again.json()).error.message).toMatch(/already been used/);

    const listed = await (await admin.request("GET", "/api/users")).json();
    expect(listed.items.find((p: { email: string }) => p.email === email).state).toBe("active");
    const events = await owner("setup_events").where({ entity: "user", entity_id: person.id }).orderBy("id").pluck("action");
    expect(events).toEqual(["invited", "invitation_accepted"]);
  });

  it("an expired link fails with a sentence; a re-sent one works and retires the old one", async () => {
    const email = `late-${stamp}@example.com`;
    const person = await invite(email);
    const first = linkIn(await waitForMail(email, { subject: "invited" }), "invite");
    await owner("account_tokens").where({ user_id: person.id }).update({ expires_at: owner.raw("NOW(3) - INTERVAL 1 MINUTE") });
    const expired = await new Client().request("POST", "/api/auth/accept-invitation", { token: first.token, password: PASSWORD });
    expect(expired.status).toBe(410);
    expect((await expired.json()).error.message).toBe("This invitation link has expired. Ask an admin of your office to send a new invitation.");
    expect(await (await new Client().request("GET", `/invite/${first.token}`)).text()).toContain("has expired");

    expect((await admin.request("POST", `/api/users/${person.id}/invitation`)).status).toBe(200);
    await expect.poll(async () => (await mailsTo(email)).length, { timeout: 30_000 }).toBe(2);
    const second = linkIn((await mailsTo(email))[0], "invite");
    expect(second.token).not.toBe(first.token);
    expect((await new Client().request("POST", "/api/auth/accept-invitation", { token: second.token, password: PASSWORD })).status).toBe(200);
  });

  it("refuses an address that already has an account, and bad input, with sentences", async () => {
    const dup = await admin.request("POST", "/api/users", { email: "clerk@example.com", name: "Twin", role: "clerk" });
    expect(dup.status).toBe(409);
    expect((await dup.json()).error.message).toMatch(/already has a Foldwright account/);
    const bad = await admin.request("POST", "/api/users", { email: "not-an-address", name: "X", role: "boss" });
    expect(bad.status).toBe(422);
  });
});

describe("forgotten password", () => {
  it("answers the same for a known and an unknown address; the link works once and ends old sessions", async () => {
    const email = `forgetful-${stamp}@example.com`;
    await acceptedPerson(email);
    const oldSession = await Client.signedIn(email, PASSWORD);

    const known = await new Client().request("POST", "/api/auth/forgot-password", { email });
    const unknown = await new Client().request("POST", "/api/auth/forgot-password", { email: `nobody-${stamp}@example.com` });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(await known.json()).toEqual(await unknown.json());

    const { token } = linkIn(await waitForMail(email, { subject: "new Foldwright password" }), "reset-password");
    const fresh = "a brand new passphrase";
    expect((await new Client().request("POST", "/api/auth/reset-password", { token, password: fresh })).status).toBe(200);
    expect((await oldSession.request("GET", "/api/auth/me")).status).toBe(401);
    await Client.signedIn(email, fresh);
    const twice = await new Client().request("POST", "/api/auth/reset-password", { token, password: "yet another passphrase" });
    expect(twice.status).toBe(410);
    // The unknown address got nothing.
    expect(await mailsTo(`nobody-${stamp}@example.com`)).toEqual([]);
  });
});

describe("changes to a person", () => {
  it("deactivation stops an open session on its next request; a role change applies on the next request", async () => {
    const email = `leaver-${stamp}@example.com`;
    const person = await acceptedPerson(email);
    const session = await Client.signedIn(email, PASSWORD);
    expect((await session.request("GET", "/api/review")).status).toBe(200);

    expect((await admin.request("PATCH", `/api/users/${person.id}`, { role: "auditor" })).status).toBe(200);
    expect((await session.request("GET", "/api/review")).status).toBe(403); // auditors have no queue

    const off = await admin.request("PATCH", `/api/users/${person.id}`, { active: false });
    expect((await off.json()).person.state).toBe("deactivated");
    expect((await session.request("GET", "/api/auth/me")).status).toBe(401);
    expect((await new Client().request("POST", "/api/auth/sign-in", { email, password: PASSWORD })).status).toBe(401);
    const actions = await owner("setup_events").where({ entity: "user", entity_id: person.id }).orderBy("id").pluck("action");
    expect(actions.slice(-2)).toEqual(["role_changed", "deactivated"]);
  });

  it("keeps the last active admin: no demotion, no deactivation", async () => {
    const adminId = (await owner("users").where({ email: "admin@example.com" }).first("id")).id;
    const others = await owner("users").where({ role: "admin" }).whereNot({ id: adminId }).where({ active: true }).pluck("id");
    await owner("users").whereIn("id", others).update({ active: false });
    try {
      for (const change of [{ role: "clerk" }, { active: false }]) {
        const res = await admin.request("PATCH", `/api/users/${adminId}`, change);
        expect(res.status).toBe(409);
        expect((await res.json()).error.message).toMatch(/last active admin/);
      }
      expect((await admin.request("GET", "/api/auth/me")).status).toBe(200);
    } finally {
      await owner("users").whereIn("id", others).update({ active: true });
    }
  });
});
