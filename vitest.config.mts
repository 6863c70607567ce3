import path from "node:path";
import { defineConfig } from "vitest/config";

// Three projects: `unit` needs nothing running; `integration` talks to the real MariaDB and
// S3 fake started by tests/global-setup.ts; `e2e` drives Debian's chromium against a built app.
export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // `server-only` throws outside React Server Components; tests call the Data Access Layer directly.
    alias: { "server-only": path.resolve(import.meta.dirname, "tests/helpers/empty.ts") },
  },
  test: {
    projects: [
      {
        extends: true,
        // A generous per-test limit: some unit tests start scikit-learn or OCR, which is slow the
        // first time on a fresh machine. It guards against hangs; it is not a speed check.
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node", testTimeout: 60_000 },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/global-setup.ts"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/global-setup.ts", "tests/e2e/app-setup.ts"],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 300_000,
          // expect.poll waits for the page, not for a speed goal: 1 s (the default) is too short
          // when a clean-clone run shares two cores with a build (seen on the holds test).
          expect: { poll: { timeout: 15_000 } },
        },
      },
    ],
  },
});
