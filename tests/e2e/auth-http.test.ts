import { afterAll, describe, expect, it } from "vitest";
import { ownerDb } from "../helpers/db";
import { BASE_URL, Client, DEMO_PASSWORD } from "./http";

// Sign-in, sign-out and cookie handling through the real route handlers of the built app.
const owner = ownerDb();
afterAll(async () => {
  await owner("users").update({ failed_sign_ins: 0, locked_until: null });
  await owner.destroy();
});

describe("sign-in over HTTP", () => {
  it("signs in, sets a sealed HttpOnly SameSite cookie, and /me answers the user", async () => {
    const client = new Client();
    const res = await client.request("POST", "/api/auth/sign-in", { email: "clerk@example.com", password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith("foldwright_session="))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toContain("clerk@example.com"); // sealed, not readable
    const me = await client.request("GET", "/api/auth/me");
    expect(me.status).toBe(200);
    expect(await me.json()).toMatchObject({ user: { email: "clerk@example.com", role: "clerk" } });
  });

  it("answers 401 with the JSON error shape for a wrong password and an unknown user", async () => {
    for (const email of ["clerk@example.com", "ghost@example.com"]) {
      const res = await new Client().request("POST", "/api/auth/sign-in", { email, password: "wrong-password" });
      expect(res.status).toBe(401);
      const body = await res.json();
      expect(body.error.code).toBe("wrong_credentials");
      expect(body.error.message).toMatch(/do not match an account/);
    }
    await owner("users").update({ failed_sign_ins: 0 });
  });

  it("answers 422 for a malformed e-mail and 400 for a body that is not JSON", async () => {
    const bad = await new Client().request("POST", "/api/auth/sign-in", { email: "not-an-address", password: "x" });
    expect(bad.status).toBe(422);
    expect((await bad.json()).error.code).toBe("bad_input");
    const res = await fetch(`${BASE_URL}/api/auth/sign-in`, { method: "POST", headers: { origin: BASE_URL, "content-type": "application/json" }, body: "{oops" });
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/not valid JSON/);
  });

  it("locks the account after repeated wrong passwords and says so (423)", async () => {
    const client = new Client();
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) {
      statuses.push((await client.request("POST", "/api/auth/sign-in", { email: "auditor@example.com", password: "nope" })).status);
    }
    expect(statuses).toEqual([401, 401, 423]); // SIGN_IN_MAX_FAILURES=3 in the test settings
    const right = await client.request("POST", "/api/auth/sign-in", { email: "auditor@example.com", password: DEMO_PASSWORD });
    expect(right.status).toBe(423);
    expect((await right.json()).error.message).toMatch(/locked after 3 wrong passwords/);
    await owner("users").update({ failed_sign_ins: 0, locked_until: null });
  });

  it("signs out: the cookie is cleared, and a copy of the old cookie no longer works", async () => {
    const client = await Client.signedIn("partner@example.com");
    const oldCookie = client.cookie;
    const out = await client.request("POST", "/api/auth/sign-out");
    expect(out.status).toBe(200);
    expect(client.cookie).toBe("");
    expect((await client.request("GET", "/api/auth/me")).status).toBe(401);
    client.cookie = oldCookie;
    expect((await client.request("GET", "/api/auth/me")).status).toBe(401);
  });

  it("rejects a tampered cookie", async () => {
    const client = await Client.signedIn("admin@example.com");
    const value = client.cookie.split("=")[1];
    const i = Math.floor(value.length / 2);
    const flipped = value.slice(0, i) + (value[i] === "a" ? "b" : "a") + value.slice(i + 1);
    client.cookie = `foldwright_session=${flipped}`;
    const me = await client.request("GET", "/api/auth/me");
    expect(me.status).toBe(401);
    expect((await me.json()).error.code).toBe("signed_out");
  });

  it("sends signed-out visitors of app pages to sign-in", async () => {
    const res = await new Client().request("GET", "/review");
    expect([302, 303, 307, 308]).toContain(res.status);
    expect(res.headers.get("location")).toMatch(/\/sign-in\?next=%2Freview$/);
  });
});
