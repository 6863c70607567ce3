// A scratch database and bucket on the local servers (started here, or reused when running),
// rebuilt from the migrations and seeds; close() removes them and stops only what it started.
// The tests and the benchmarks use it; set DATABASE_NAME and S3_BUCKET before calling.
export async function openScratchStack() {
  const { env } = await import("@/lib/env");
  const { startServices } = await import("@/lib/stack/services");
  const { dropDatabase } = await import("@/db/local-server");
  const { migrateDatabase, seedDatabase } = await import("@/db/migrate");
  const services = await startServices([env.s3.bucket]);
  await dropDatabase(env.db.name);
  await migrateDatabase(env.db.name);
  await seedDatabase(env.db.name);
  return {
    env,
    async close() {
      const { closeDb } = await import("@/db");
      const { emptyBucket } = await import("@/tests/helpers/storage");
      await closeDb();
      await emptyBucket(env.s3.bucket).catch(() => {});
      await dropDatabase(env.db.name).catch(() => {});
      await services.stop();
    },
  };
}

/** Runs a benchmark's main and exits with its outcome (workers and pools would keep it alive). */
export function runBench(main: () => Promise<void>): void {
  main().then(
    () => process.exit(0),
    (e) => {
      console.error(e);
      process.exit(1);
    },
  );
}
