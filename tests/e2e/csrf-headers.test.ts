import { beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, Client } from "./http";
import { listRoutesAndPages, samplePath, writeMethods } from "./app-files";

// CSRF (lib/csrf.ts): every write route, found by walking app/api so that a new one cannot be
// missed, refuses a write that does not come from the app's own origin, and a body that is not
// JSON or multipart. The attacks are those of the OWASP CSRF Prevention Cheat Sheet ("Verifying
// origin with standard headers"; "null" is the Origin of sandboxed frames and data: pages, per the
// Fetch standard's "serializing a request origin"): no Origin, a foreign one, `null`, and JSON sent
// as text/plain (the one body a cross-site form can post that a JSON parser accepts).
const WRITES = listRoutesAndPages()
  .filter((f) => f.startsWith("api/") && f.endsWith("route.ts"))
  .flatMap((file) => writeMethods(file).map((method) => ({ file, method, path: `${samplePath(file)}` })));

let admin: Client;

async function send(method: string, path: string, headers: Record<string, string>, body = '{"name":"x"}') {
  return fetch(`${BASE_URL}${path}`, { method, headers: { cookie: admin.cookie, ...headers }, body, redirect: "manual" });
}

beforeAll(async () => {
  admin = await Client.signedIn("admin@example.com");
});

describe("CSRF: every write route", () => {
  it("finds the write routes (a walk that found none would prove nothing)", () => {
    // 28 is the count on the day this test was written; more is fine, fewer means the walk broke.
    expect(WRITES.length).toBeGreaterThanOrEqual(28);
    expect(WRITES.map((w) => `${w.method} ${w.path}`)).toContain("POST /api/documents");
  });

  const cases: { name: string; headers: Record<string, string>; code: string }[] = [
    { name: "no Origin", headers: { "content-type": "application/json" }, code: "cross_site" },
    { name: "a foreign Origin", headers: { origin: "https://evil.example", "content-type": "application/json" }, code: "cross_site" },
    { name: "Origin null", headers: { origin: "null", "content-type": "application/json" }, code: "cross_site" },
    { name: "no Origin and Sec-Fetch-Site cross-site", headers: { "sec-fetch-site": "cross-site", "content-type": "application/json" }, code: "cross_site" },
    { name: "its own Origin but JSON sent as text/plain", headers: { origin: BASE_URL, "content-type": "text/plain;charset=UTF-8" }, code: "wrong_content_type" },
  ];

  for (const c of cases) {
    it(`answers 403 with a sentence for ${c.name}`, async () => {
      const wrong: string[] = [];
      for (const w of WRITES) {
        const res = await send(w.method, w.path, c.headers);
        const body = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
        if (res.status !== 403 || body?.error?.code !== c.code || !/refused/.test(body.error.message ?? "")) {
          wrong.push(`${w.method} ${w.path} (${w.file}): ${res.status} ${JSON.stringify(body)}`);
        }
      }
      expect(wrong).toEqual([]);
    });
  }

  it("changed nothing: the session the refused sign-outs carried is still signed in", async () => {
    expect((await admin.request("GET", "/api/auth/me")).status).toBe(200);
  });

  it("takes a write from its own origin, or with Sec-Fetch-Site same-origin when Origin is absent", async () => {
    // A wrong password is a 401: the request reached the handler.
    const login = JSON.stringify({ email: "nobody@example.com", password: "x" });
    const byOrigin = await send("POST", "/api/auth/sign-in", { origin: BASE_URL, "content-type": "application/json" }, login);
    expect(byOrigin.status).toBe(401);
    const byFetchMetadata = await send("POST", "/api/auth/sign-in", { "sec-fetch-site": "same-origin", "content-type": "application/json" }, login);
    expect(byFetchMetadata.status).toBe(401);
  });
});
