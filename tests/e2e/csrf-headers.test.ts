import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { BASE_URL, Client, DEMO_PASSWORD } from "./http";
import { listRoutesAndPages, samplePath, writeMethods } from "./app-files";
import { launchBrowser } from "./browser";
import { makeTextPdf } from "../helpers/make-files";

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

// Security headers (lib/security-headers.ts, proxy.ts, next.config.mjs). Sources: W3C CSP Level 3
// (nonce sources, 'strict-dynamic', frame-ancestors), RFC 7034 (X-Frame-Options: DENY), Fetch
// standard (X-Content-Type-Options: nosniff), W3C Referrer Policy (same-origin), RFC 6797 §7.2
// (HSTS is sent over secure transport only).
function fixedHeaders(res: Response) {
  expect(res.headers.get("x-content-type-options")).toBe("nosniff");
  expect(res.headers.get("x-frame-options")).toBe("DENY");
  expect(res.headers.get("referrer-policy")).toBe("same-origin");
  expect(res.headers.get("permissions-policy")).toMatch(/camera=\(\)/);
  expect(res.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
}

function directive(policy: string, name: string): string | undefined {
  return policy.split(";").map((d) => d.trim()).find((d) => d.split(/\s+/)[0] === name);
}

describe("security headers", () => {
  it("on a page: a CSP whose script nonce is fresh per answer and on every script the page carries", async () => {
    const nonces: string[] = [];
    for (let i = 0; i < 2; i++) {
      const res = await fetch(`${BASE_URL}/sign-in`);
      expect(res.status).toBe(200);
      fixedHeaders(res);
      const policy = res.headers.get("content-security-policy") ?? "";
      const script = directive(policy, "script-src") ?? "";
      expect(script).toMatch(/'strict-dynamic'/);
      expect(script).not.toMatch(/'unsafe-inline'|'unsafe-eval'|\*/);
      const nonce = /'nonce-([^']+)'/.exec(script)?.[1];
      expect(nonce).toBeTruthy();
      expect(directive(policy, "object-src")).toBe("object-src 'none'");
      const html = await res.text();
      const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(0);
      expect(scripts.filter((tag) => !tag.includes(`nonce="${nonce}"`))).toEqual([]);
      nonces.push(nonce!);
      // Plain HTTP here: no HSTS (a browser would ignore it anyway, RFC 6797 §8.1).
      expect(res.headers.get("strict-transport-security")).toBeNull();
    }
    expect(nonces[0]).not.toBe(nonces[1]);
  });

  it("on an API answer, a download and a CSV: a policy that runs nothing", async () => {
    const clerk = await Client.signedIn("clerk@example.com");
    const me = await clerk.request("GET", "/api/auth/me");
    const form = new FormData();
    const pdf = await makeTextPdf([["Security headers probe", `Made ${Date.now()}`]]);
    form.append("file", new Blob([new Uint8Array(pdf)], { type: "application/pdf" }), "headers-probe.pdf");
    const up = await clerk.request("POST", "/api/documents", form);
    expect(up.status).toBe(201);
    const id = ((await up.json()) as { files: { id: number }[] }).files[0].id;
    const original = await clerk.request("GET", `/api/documents/${id}/original`);
    expect(original.status).toBe(200);
    const csv = await admin.request("GET", "/api/filing-events?format=csv");
    expect(csv.status).toBe(200);
    for (const res of [me, up, original, csv]) {
      fixedHeaders(res);
      const policy = res.headers.get("content-security-policy") ?? "";
      expect(directive(policy, "default-src")).toBe("default-src 'none'");
      expect(directive(policy, "script-src")).toBeUndefined();
    }
  });

  it("sends HSTS when the request came over HTTPS (a TLS proxy's X-Forwarded-Proto)", async () => {
    for (const path of ["/sign-in", "/api/health"]) {
      const res = await fetch(`${BASE_URL}${path}`, { headers: { "x-forwarded-proto": "https" } });
      expect(res.headers.get("strict-transport-security")).toMatch(/^max-age=\d{8,}; includeSubDomains$/);
    }
  });
});

describe("the pages under that policy in Chromium", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("sign in and open each area with no CSP violation and no script error", async () => {
    const page = await browser.newPage();
    const problems: string[] = [];
    page.on("console", (m) => {
      // A failed load is reported with its address by the response handler below.
      if (/^Failed to load resource/.test(m.text())) return;
      if (m.type() === "error" || /Content Security Policy/i.test(m.text())) problems.push(`${page.url()}: ${m.text()}`);
    });
    // The app has no favicon; the browser's own request for one is not the page's doing.
    page.on("response", (r) => {
      if (r.status() >= 400 && !r.url().endsWith("/favicon.ico")) problems.push(`${r.url()}: ${r.status()}`);
    });
    page.on("pageerror", (e) => problems.push(`${page.url()}: ${e.message}`));
    await page.addInitScript(() => {
      document.addEventListener("securitypolicyviolation", (e) => console.error(`CSP violation: ${e.violatedDirective} ${e.blockedURI}`));
    });
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByLabel("E-mail").fill("admin@example.com");
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    // Client-side navigation through the areas (the scripts loaded under the nonce must work).
    const areas = await page.getByRole("navigation", { name: "Areas" }).getByRole("link").allTextContents();
    expect(areas.length).toBeGreaterThan(4);
    for (const name of areas) {
      await page.getByRole("navigation", { name: "Areas" }).getByRole("link", { name }).click();
      await page.waitForLoadState("networkidle");
    }
    // A full load of a page with progress bars (style attributes) and a form.
    await page.goto(`${BASE_URL}/models`);
    await page.waitForLoadState("networkidle");
    expect(problems).toEqual([]);
    await page.close();
  });
});
