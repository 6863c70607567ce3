// `npm start`: starts MariaDB and the S3 fake on loopback (or reuses running ones), migrates and
// seeds the demo office, builds the app when needed and serves it on 127.0.0.1:PORT.
// Ctrl-C stops what this command started.
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { env } from "@/lib/env";
import { migrateDatabase, seedDatabase } from "@/db/migrate";
import { DEMO_USERS } from "@/db/demo/office";
import { startServices } from "@/lib/stack/services";
import { localSessionSecret } from "@/lib/stack/secret";
import { run, stopChild, waitFor } from "@/lib/stack/process";

const dev = process.argv.includes("--dev");

function buildIsFresh(): boolean {
  const marker = path.join(env.root, ".next", "BUILD_ID");
  if (!fs.existsSync(marker)) return false;
  const built = fs.statSync(marker).mtimeMs;
  const newer = (dir: string): boolean =>
    fs.readdirSync(path.join(env.root, dir), { withFileTypes: true }).some((e) => {
      const rel = path.join(dir, e.name);
      if (e.isDirectory()) return newer(rel);
      return fs.statSync(path.join(env.root, rel)).mtimeMs > built;
    });
  return !["app", "components", "lib", "db", "storage"].some((d) => fs.existsSync(path.join(env.root, d)) && newer(d));
}

async function main(): Promise<void> {
  const t0 = Date.now();
  console.log("Starting MariaDB and the S3 fake on 127.0.0.1 …");
  const services = await startServices();
  console.log(`  MariaDB ${services.database.startedHere ? "started" : "already running"} on 127.0.0.1:${env.db.port}`);
  console.log(`  S3 fake ${services.storage.startedHere ? "started" : "already running"} at ${env.s3.endpoint}`);
  await migrateDatabase();
  await seedDatabase();
  console.log(`  Database "${env.db.name}" migrated and seeded with the demo office.`);

  const childEnv = { ...process.env, NEXT_TELEMETRY_DISABLED: "1", SESSION_SECRET: env.session.secret || localSessionSecret() };
  const next = path.join(env.root, "node_modules/next/dist/bin/next");
  if (!dev && !buildIsFresh()) {
    console.log("Building the app (next build) …");
    await run(process.execPath, [next, "build"], { env: { ...childEnv, NODE_ENV: "production" }, cwd: env.root });
  }
  const server = spawn(process.execPath, [next, dev ? "dev" : "start", "-H", "127.0.0.1", "-p", String(env.port)], {
    env: childEnv,
    cwd: env.root,
    stdio: ["ignore", "inherit", "inherit"],
  });
  const url = `http://127.0.0.1:${env.port}`;
  await waitFor("The web app", async () => {
    if (server.exitCode !== null) throw new Error("The web app stopped at start; see the lines above.");
    return fetch(`${url}/api/health`).then((r) => r.ok, () => false);
  }, 120_000);

  console.log(`\nFoldwright is ready at ${url}/sign-in  (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
  console.log(`Demo sign-ins (password "${env.demoPassword}"):`);
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(8)} ${u.email}`);
  console.log("Press Ctrl-C to stop.");

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    console.log("\nStopping …");
    await stopChild(server);
    await services.stop();
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  server.on("exit", () => void stop());
}

main().catch((e) => {
  console.error(`\nFoldwright could not start: ${e instanceof Error ? e.message : e}`);
  process.exit(1);
});
