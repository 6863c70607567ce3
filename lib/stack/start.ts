// `npm start`: starts MariaDB and the S3 fake on loopback (or reuses running ones), migrates and
// seeds the demo office, builds the app when needed and serves it on 127.0.0.1:PORT.
// Ctrl-C stops what this command started.
import { env } from "@/lib/env";
import { migrateDatabase, seedDatabase } from "@/db/migrate";
import { DEMO_USERS } from "@/db/demo/office";
import { startServices } from "@/lib/stack/services";
import { localSessionSecret } from "@/lib/stack/secret";
import { buildApp, serveApp } from "@/lib/stack/app-server";

const dev = process.argv.includes("--dev");

/** So that the first screen a visitor sees has real suggestions. */
async function trainFirstModel(): Promise<void> {
  const { findCurrentModel, getModelVersion } = await import("@/lib/data/models");
  const { FOLDWRIGHT } = await import("@/lib/data/users");
  if (await findCurrentModel()) return;
  console.log("  Training the first model on the demo office's filed documents …");
  const { trainNow } = await import("@/lib/learning/retrain");
  const v = await getModelVersion(FOLDWRIGHT, await trainNow("start"));
  if (v.status === "current") {
    console.log(`  Model version #${v.id}: ${v.trainCount} documents, cross-validated macro-F1 ${v.macroF1?.toFixed(3)}, accuracy ${v.accuracy?.toFixed(3)} (${((v.durationMs ?? 0) / 1000).toFixed(1)} s).`);
  } else {
    console.log(`  No model yet: ${v.reason}`);
  }
}

/** Documents waiting without a suggestion (the demo's, or after a crash) get one queued. */
async function queueSuggestions(): Promise<void> {
  const { queueMissingSuggestions } = await import("@/lib/data/suggestions");
  const n = await queueMissingSuggestions();
  if (n) console.log(`  ${n} waiting document${n === 1 ? "" : "s"} queued for suggestions.`);
  const { closeDb } = await import("@/db");
  await closeDb();
}

async function main(): Promise<void> {
  const t0 = Date.now();
  console.log("Starting MariaDB, the S3 fake and the mail catcher on 127.0.0.1 …");
  const services = await startServices();
  const stopServices = () => services.stop();
  process.once("SIGINT", () => void stopServices().then(() => process.exit(130)));
  console.log(`  MariaDB ${services.database.startedHere ? "started" : "already running"} on 127.0.0.1:${env.db.port}`);
  console.log(`  S3 fake ${services.storage.startedHere ? "started" : "already running"} at ${env.s3.endpoint}`);
  if (services.mail) console.log(`  Mail catcher ${services.mail.startedHere ? "started" : "already running"} on 127.0.0.1:${env.mail.catcherPort} (messages in ${services.mail.dir})`);
  await migrateDatabase();
  await seedDatabase();
  console.log(`  Database "${env.db.name}" migrated and seeded with the demo office.`);
  await trainFirstModel();
  await queueSuggestions();

  const appEnv = { SESSION_SECRET: env.session.secret || localSessionSecret(), AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true" };
  if (!dev) {
    console.log("Building the app when its sources changed (next build) …");
    if (await buildApp(".next", appEnv)) console.log("  Built.");
  }
  const server = await serveApp({ distDir: ".next", port: env.port, dev, env: appEnv });
  process.removeAllListeners("SIGINT");

  console.log(`\nFoldwright is ready at ${server.url}/sign-in  (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
  console.log(`Demo sign-ins (password "${env.demoPassword}"):`);
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(8)} ${u.email}`);
  if (env.mail.intakeEnabled) console.log(`Scans by e-mail: send to ${env.mail.intakeAddress} through SMTP on 127.0.0.1:${env.mail.intakePort} (allowed senders: Setup › Allowed senders).`);
  console.log("Press Ctrl-C to stop.");

  let stopping = false;
  const stop = async (code: number) => {
    if (stopping) return;
    stopping = true;
    console.log("\nStopping what this command started …");
    await server.stop();
    await services.stop();
    process.exit(code);
  };
  process.on("SIGINT", () => void stop(0));
  process.on("SIGTERM", () => void stop(0));
  server.child.on("exit", () => void stop(1));
}

main().catch((e) => {
  console.error(`\nFoldwright could not start: ${e instanceof Error ? e.message : e}`);
  process.exit(1);
});
