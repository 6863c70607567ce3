// The settings every integration and e2e test runs with: its own database and bucket on the
// same local servers, and an app port of its own. Applied before lib/env is first imported.
export const TEST_ENV: Record<string, string> = {
  DATABASE_NAME: "foldwright_test",
  S3_BUCKET: "foldwright-test",
  PORT: "3100",
  SESSION_SECRET: "test-only-session-secret-0123456789abcdef",
  BCRYPT_COST: "4",
  SIGN_IN_MAX_FAILURES: "3",
  // Rate limits well above what the whole e2e suite sends from 127.0.0.1 in an hour (the role
  // matrix alone asks for the same reset five times); tests/integration/rate-limit.test.ts
  // checks each limit at these values.
  SIGN_IN_ADDRESS_MAX_FAILURES: "40",
  RESET_REQUESTS_PER_HOUR: "20",
  LINK_ATTEMPTS_PER_ADDRESS_PER_HOUR: "300",
  ATTEMPTS_PER_LINK_PER_HOUR: "40",
  UPLOAD_MAX_BYTES: String(2 * 1024 * 1024),
  JOBS_POLL_MS: "250",
  // Scans by e-mail: a small limit so the oversize refusal needs only a few megabytes.
  MAIL_INTAKE_MAX_BYTES: String(3 * 1024 * 1024),
  SEED_DEMO_DOCUMENTS: "false",
  NEXT_TELEMETRY_DISABLED: "1",
  AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
};

export function applyTestEnv(): void {
  for (const [k, v] of Object.entries(TEST_ENV)) if (process.env[k] === undefined) process.env[k] = v;
}
