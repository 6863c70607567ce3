import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// Server actions are public endpoints (the Next.js data-security guide): every exported action
// must check who is asking, or be listed here as public on purpose. This reads each
// 'use server' module under app/, so a new action cannot be added without joining the list.
const PUBLIC_ACTIONS: Record<string, string> = {
  "app/(auth)/sign-in/actions.ts#signInAction": "signing in is for signed-out visitors",
  "app/(auth)/sign-in/actions.ts#signOutAction": "signing out is allowed to anyone, signed in or not",
};

function serverActionModules(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return serverActionModules(full);
    return /\.tsx?$/.test(e.name) && /^\s*["']use server["']/.test(fs.readFileSync(full, "utf8")) ? [full] : [];
  });
}

describe("server actions", () => {
  const root = path.resolve(__dirname, "../..");
  const modules = serverActionModules(path.join(root, "app"));

  it("finds the 'use server' modules", () => {
    expect(modules.map((m) => path.relative(root, m))).toContain("app/(auth)/sign-in/actions.ts");
  });

  it("each exported action checks the user with requireUser, or is public on purpose", () => {
    const unchecked: string[] = [];
    for (const file of modules) {
      const source = fs.readFileSync(file, "utf8");
      for (const match of source.matchAll(/export async function (\w+)\s*\(([\s\S]*?)\n}/g)) {
        const key = `${path.relative(root, file)}#${match[1]}`;
        if (!(key in PUBLIC_ACTIONS) && !/await requireUser\(/.test(match[2])) unchecked.push(key);
      }
    }
    expect(unchecked).toEqual([]);
  });

  it("lists only public actions that still exist", () => {
    const exported = new Set(
      modules.flatMap((file) => [...fs.readFileSync(file, "utf8").matchAll(/export async function (\w+)/g)].map((m) => `${path.relative(root, file)}#${m[1]}`)),
    );
    expect(Object.keys(PUBLIC_ACTIONS).filter((k) => !exported.has(k))).toEqual([]);
  });
});
