// Starts MariaDB and the S3 fake for the tests, or reuses running ones; rebuilds the test
// database from the migrations and seeds; on teardown drops it, empties the test bucket and
// stops only what it started.
import { applyTestEnv } from "./test-env";

export default async function setup() {
  applyTestEnv();
  const { env } = await import("@/lib/env");
  const { startServices } = await import("@/lib/stack/services");
  const { dropDatabase } = await import("@/db/local-server");
  const { migrateDatabase, seedDatabase } = await import("@/db/migrate");
  const services = await startServices([env.s3.bucket]);
  await dropDatabase(env.db.name);
  await migrateDatabase(env.db.name);
  await seedDatabase(env.db.name);
  return async () => {
    const { emptyBucket } = await import("./helpers/storage");
    await emptyBucket(env.s3.bucket).catch(() => {});
    await dropDatabase(env.db.name).catch(() => {});
    await services.stop();
  };
}
