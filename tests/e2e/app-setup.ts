// Builds the app into .next-test when its sources changed and serves it on the test port
// against the test database and bucket (the earlier global setup made them).
import { applyTestEnv } from "../test-env";

export default async function setup() {
  applyTestEnv();
  const { env } = await import("@/lib/env");
  const { buildApp, serveApp } = await import("@/lib/stack/app-server");
  await buildApp(".next-test");
  const server = await serveApp({ distDir: ".next-test", port: env.port, quiet: true });
  process.env.FOLDWRIGHT_TEST_URL = server.url;
  return () => server.stop();
}
