// Starts MariaDB and the S3 fake for the tests, or reuses running ones; rebuilds the test
// database from the migrations and seeds; on teardown drops it, empties the test bucket and
// stops only what it started.
import { applyTestEnv } from "./test-env";

export default async function setup() {
  applyTestEnv();
  const { openScratchStack } = await import("@/lib/stack/scratch-stack");
  const stack = await openScratchStack();
  return () => stack.close();
}
