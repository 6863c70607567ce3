import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { Client } from "./http";

// Every route handler and page × every role (and signed out) → the expected status.
// DESIGN.md §2 is the source of the expectations. A new route must join MATRIX: the last test
// fails when a route file exists that the matrix does not list.
type Who = "signedOut" | "clerk" | "partner" | "admin" | "auditor";
const WHO: Who[] = ["signedOut", "clerk", "partner", "admin", "auditor"];

interface Row {
  method: string;
  path: string;
  file: string; // the route file under app/, to prove coverage
  body?: unknown;
  expect: Record<Who, number>;
}

const all = (signedIn: number, signedOut: number) =>
  ({ signedOut, clerk: signedIn, partner: signedIn, admin: signedIn, auditor: signedIn }) as Record<Who, number>;
const page = (allowed: Who[]) =>
  Object.fromEntries(WHO.map((w) => [w, w === "signedOut" ? 307 : allowed.includes(w) ? 200 : 403])) as Record<Who, number>;

const MATRIX: Row[] = [
  { method: "GET", path: "/api/health", file: "api/health/route.ts", expect: all(200, 200) },
  { method: "GET", path: "/api/auth/me", file: "api/auth/me/route.ts", expect: all(200, 401) },
  // A sign-in with a wrong password is a 401 for anyone; it never locks the demo accounts here
  // because it names an address that has no account.
  { method: "POST", path: "/api/auth/sign-in", file: "api/auth/sign-in/route.ts", body: { email: "nobody@example.com", password: "x" }, expect: all(401, 401) },
  { method: "POST", path: "/api/auth/sign-out", file: "api/auth/sign-out/route.ts", expect: all(200, 200) },
  { method: "GET", path: "/intake", file: "(app)/intake/page.tsx", expect: page(["clerk", "admin"]) },
  { method: "GET", path: "/review", file: "(app)/review/page.tsx", expect: page(["clerk", "partner", "admin"]) },
  { method: "GET", path: "/cabinets", file: "(app)/cabinets/page.tsx", expect: page(["clerk", "partner", "admin", "auditor"]) },
  { method: "GET", path: "/history", file: "(app)/history/page.tsx", expect: page(["admin", "auditor"]) },
  { method: "GET", path: "/models", file: "(app)/models/page.tsx", expect: page(["admin", "auditor"]) },
  { method: "GET", path: "/setup", file: "(app)/setup/page.tsx", expect: page(["admin"]) },
];

const clients = {} as Record<Who, Client>;

describe("role matrix", () => {
  beforeAll(async () => {
    clients.signedOut = new Client();
    for (const role of ["clerk", "partner", "admin", "auditor"] as const) clients[role] = await Client.signedIn(`${role}@example.com`);
  });

  for (const row of MATRIX) {
    it(`${row.method} ${row.path}`, async () => {
      const got: Record<string, number> = {};
      for (const who of WHO) {
        got[who] = (await clients[who].request(row.method, row.path, row.body)).status;
        // Sign-out ends every session of that user: sign in again for the rows after it.
        if (row.path === "/api/auth/sign-out" && who !== "signedOut") clients[who] = await Client.signedIn(`${who}@example.com`);
      }
      expect(got).toEqual(row.expect);
    });
  }

  it("lists every route handler and page that exists", () => {
    const appDir = path.resolve(__dirname, "../../app");
    const found: string[] = [];
    const walk = (dir: string) => {
      for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
        const full = path.join(dir, e.name);
        if (e.isDirectory()) walk(full);
        else if (/^(route\.ts|page\.tsx)$/.test(e.name)) found.push(path.relative(appDir, full));
      }
    };
    walk(appDir);
    const exempt = ["(auth)/sign-in/page.tsx", "(app)/page.tsx"]; // public sign-in; home only redirects
    const listed = new Set(MATRIX.map((r) => r.file));
    expect(found.filter((f) => !listed.has(f) && !exempt.includes(f)).sort()).toEqual([]);
  });
});
