// Builds the Next.js app when its sources changed since the last build, and serves it.
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { env } from "@/lib/env";
import { run, stopChild, waitFor } from "@/lib/stack/process";

const SOURCES = ["app", "components", "lib", "db", "storage", "proxy.ts", "next.config.mjs", "tailwind.config.ts", "package-lock.json"];
const NEXT_BIN = () => path.join(env.root, "node_modules/next/dist/bin/next");

function newestChange(entry: string): number {
  const full = path.join(env.root, entry);
  if (!fs.existsSync(full)) return 0;
  const stat = fs.statSync(full);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return fs
    .readdirSync(full)
    .reduce((latest, child) => Math.max(latest, newestChange(path.join(entry, child))), stat.mtimeMs);
}

export function buildIsFresh(distDir: string): boolean {
  const marker = path.join(env.root, distDir, "BUILD_ID");
  if (!fs.existsSync(marker)) return false;
  const built = fs.statSync(marker).mtimeMs;
  return SOURCES.every((s) => newestChange(s) < built);
}

export async function buildApp(distDir: string, extraEnv: Record<string, string> = {}): Promise<boolean> {
  if (buildIsFresh(distDir)) return false;
  await run(process.execPath, [NEXT_BIN(), "build"], {
    cwd: env.root,
    env: { ...process.env, ...extraEnv, NEXT_DIST_DIR: distDir, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" },
  });
  return true;
}

export interface AppServer {
  url: string;
  child: ChildProcess;
  stop(): Promise<void>;
}

export async function serveApp(options: { distDir: string; port: number; dev?: boolean; env?: Record<string, string>; quiet?: boolean }): Promise<AppServer> {
  const child = spawn(process.execPath, [NEXT_BIN(), options.dev ? "dev" : "start", "-H", "127.0.0.1", "-p", String(options.port)], {
    cwd: env.root,
    // PORT too: the app's own origin (APP_ORIGIN's default, the CSRF check) is on the port it serves.
    env: { ...process.env, PORT: String(options.port), ...options.env, NEXT_DIST_DIR: options.distDir, NEXT_TELEMETRY_DISABLED: "1" },
    stdio: ["ignore", options.quiet ? "ignore" : "inherit", "inherit"],
  });
  const url = `http://127.0.0.1:${options.port}`;
  await waitFor(
    "The web app",
    async () => {
      if (child.exitCode !== null) throw new Error("The web app stopped at start; see the lines above.");
      return fetch(`${url}/api/health`).then(() => true, () => false);
    },
    120_000,
  );
  return { url, child, stop: () => stopChild(child) };
}
