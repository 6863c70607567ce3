// The one module that reads process.env. Every setting has a safe local default; `.env.example`
// documents each. Outside development the session secret must be at least 32 characters.
import path from "node:path";

// Every command (npm scripts, next start, vitest) runs from the repository root.
const root = process.cwd();

function text(name: string, fallback: string): string {
  const value = process.env[name];
  return value === undefined || value === "" ? fallback : value;
}

function int(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0) {
    throw new Error(`${name} must be a whole number, got "${raw}". Fix it in the environment and start again.`);
  }
  return value;
}

function hour(name: string, fallback: number): number {
  const value = int(name, fallback);
  if (value > 23) throw new Error(`${name} is an hour of the day from 0 to 23, got ${value}. Fix it in the environment and start again.`);
  return value;
}

function bool(name: string, fallback: boolean): boolean {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  return ["1", "true", "yes", "on"].includes(raw.toLowerCase());
}

function origins(primary: string): string[] {
  const raw = text("APP_ORIGINS", "");
  const listed = raw.split(/[\s,]+/).filter(Boolean);
  // Without APP_ORIGIN the app is local: 127.0.0.1 and localhost on its port are the same machine.
  const local = process.env.APP_ORIGIN ? [] : [primary.replace("127.0.0.1", "localhost")];
  return [...new Set([primary, ...local, ...listed].map((o) => {
    try {
      const url = new URL(o);
      if (url.protocol !== "http:" && url.protocol !== "https:") throw new Error();
      return url.origin;
    } catch {
      throw new Error(`APP_ORIGIN or APP_ORIGINS holds "${o}", which is not an origin like https://files.example.com. Fix it in the environment and start again.`);
    }
  }))];
}

const port = int("PORT", 3000);
const catcherPort = int("MAIL_CATCHER_PORT", 1025);
const appOrigin = text("APP_ORIGIN", `http://127.0.0.1:${port}`).replace(/\/+$/, "");
const dataDir = text("FOLDWRIGHT_DATA_DIR", path.join(root, ".data"));

export const env = {
  root,
  production: process.env.NODE_ENV === "production",
  port,
  /** Where people reach the app: the base of links sent by e-mail (invitations, resets). */
  origin: appOrigin,
  /** Every origin a browser may send writes from: APP_ORIGIN plus the APP_ORIGINS list (the CSRF check). */
  origins: origins(appOrigin),
  /** Served over HTTPS (an https APP_ORIGIN, as in production): HSTS on every answer, Secure cookie. */
  https: appOrigin.startsWith("https://"),
  dataDir,
  db: {
    host: text("DATABASE_HOST", "127.0.0.1"),
    port: int("DATABASE_PORT", 33306),
    name: text("DATABASE_NAME", "foldwright"),
    user: text("DATABASE_USER", "foldwright_app"),
    password: text("DATABASE_PASSWORD", "foldwright-local-app"),
    adminUser: text("DATABASE_ADMIN_USER", "root"),
    adminPassword: text("DATABASE_ADMIN_PASSWORD", ""),
    poolMax: int("DATABASE_POOL_MAX", 10),
    /** A new connection's TCP connect and handshake (a frozen server accepts the TCP connection and never answers). */
    connectTimeoutMs: int("DATABASE_CONNECT_TIMEOUT_MS", 5000),
    /** Waiting for a free pooled connection (Knex's acquireConnectionTimeout). */
    acquireTimeoutMs: int("DATABASE_ACQUIRE_TIMEOUT_MS", 5000),
    /**
     * One statement of the app: the client gives up after this (mysql2's per-query timeout) and
     * the server aborts it too (MariaDB's max_statement_time, whole seconds). 0 turns both off.
     */
    queryTimeoutMs: int("DATABASE_QUERY_TIMEOUT_MS", 20_000),
    /** Start a private mariadbd under .data/ when nothing answers (local machines only). */
    startLocal: bool("DATABASE_START_LOCAL", true),
  },
  s3: {
    endpoint: text("S3_ENDPOINT", "http://127.0.0.1:4568"),
    region: text("S3_REGION", "us-east-1"),
    bucket: text("S3_BUCKET", "foldwright-originals"),
    accessKeyId: text("S3_ACCESS_KEY_ID", "S3RVER"),
    secretAccessKey: text("S3_SECRET_ACCESS_KEY", "S3RVER"),
    forcePathStyle: bool("S3_FORCE_PATH_STYLE", true),
    startLocal: bool("S3_START_LOCAL", true),
    /** Opening a connection to the store, and the longest silence on one (not a whole transfer's time). */
    connectTimeoutMs: int("S3_CONNECT_TIMEOUT_MS", 5000),
    requestTimeoutMs: int("S3_REQUEST_TIMEOUT_MS", 30_000),
  },
  session: {
    secret: text("SESSION_SECRET", ""),
    idleMinutes: int("SESSION_IDLE_MINUTES", 30),
    maxHours: int("SESSION_MAX_HOURS", 12),
    /** On by default when APP_ORIGIN is https; a local http address keeps it off so sign-in works. */
    secureCookie: bool("SESSION_SECURE_COOKIE", appOrigin.startsWith("https://")),
  },
  signIn: {
    maxFailures: int("SIGN_IN_MAX_FAILURES", 5),
    lockMinutes: int("SIGN_IN_LOCK_MINUTES", 15),
    bcryptCost: int("BCRYPT_COST", 11),
    /** Wrong sign-ins from one client address (over any accounts) per SIGN_IN_LOCK_MINUTES. */
    addressMaxFailures: int("SIGN_IN_ADDRESS_MAX_FAILURES", 30),
  },
  /** Rate limits kept in MariaDB (lib/data/rate-limit.ts), shared by every instance. */
  limits: {
    /** Password-reset e-mails asked for one address per hour (known or not: the answer is the same). */
    resetRequestsPerAccount: int("RESET_REQUESTS_PER_HOUR", 3),
    /** Reset requests, reset and invitation attempts from one client address per hour. */
    linkAttemptsPerAddress: int("LINK_ATTEMPTS_PER_ADDRESS_PER_HOUR", 30),
    /** Attempts to set a password through one link per hour (a rule refused, a retry). */
    attemptsPerLink: int("ATTEMPTS_PER_LINK_PER_HOUR", 10),
    /** Upload requests per person per minute: far above a clerk's drops, below a runaway script. */
    uploadsPerMinute: int("UPLOADS_PER_MINUTE", 600),
  },
  /**
   * Proxies in front of the app that append the client's address to X-Forwarded-For. 0: the
   * address is the connection's own and X-Forwarded-For sent by a client is ignored.
   */
  trustedProxyHops: int("TRUSTED_PROXY_HOPS", 0),
  demoPassword: text("DEMO_PASSWORD", "foldwright-demo"),
  /** Seed an empty office with a few hundred generated, filed demo documents. */
  seedDemoDocuments: bool("SEED_DEMO_DOCUMENTS", true),
  uploadMaxBytes: int("UPLOAD_MAX_BYTES", 50 * 1024 * 1024),
  uploadMaxFiles: int("UPLOAD_MAX_FILES", 50),
  imports: {
    // A whole archive (zip or folder) in one import; each file in it keeps UPLOAD_MAX_BYTES.
    maxBytes: int("IMPORT_MAX_BYTES", 20 * 1024 * 1024 * 1024),
    maxFiles: int("IMPORT_MAX_FILES", 20_000),
  },
  read: {
    timeLimitMs: int("READ_TIME_LIMIT_SECONDS", 120) * 1000,
    pageTimeLimitMs: int("READ_PAGE_TIME_LIMIT_SECONDS", 60) * 1000,
    maxPages: int("READ_MAX_PAGES", 500),
  },
  retrain: {
    /** Cron expression of the nightly retraining; empty turns it off. */
    cron: text("RETRAIN_CRON", "0 2 * * *"),
    timeZone: text("OFFICE_TIME_ZONE", "UTC"),
  },
  mail: {
    /** Outgoing SMTP; by default the local mail catcher. Any hosted provider works by configuration. */
    host: text("MAIL_HOST", "127.0.0.1"),
    port: int("MAIL_PORT", catcherPort),
    secure: bool("MAIL_SECURE", false), // TLS from the first byte (port 465); STARTTLS is used when offered otherwise
    user: text("MAIL_USER", ""),
    password: text("MAIL_PASSWORD", ""),
    from: text("MAIL_FROM", "Foldwright <foldwright@alderquay.example>"),
    /** Sending attempts before a message is marked failed; backoff is capped by JOBS_RETRY_MAX_SECONDS. */
    maxAttempts: int("MAIL_MAX_ATTEMPTS", 100),
    /** The local catcher: an SMTP server on 127.0.0.1 that writes each message to catcherDir as .eml. */
    catcherPort,
    catcherDir: text("MAIL_CATCHER_DIR", path.join(dataDir, "mail")),
    startCatcher: bool("MAIL_START_CATCHER", true),
    /** Scans by e-mail: the SMTP listener on 127.0.0.1 for the office's intake address. */
    intakeEnabled: bool("MAIL_INTAKE_ENABLED", true),
    intakePort: int("MAIL_INTAKE_PORT", 2525),
    intakeAddress: text("INTAKE_ADDRESS", "intake@alderquay.example").toLowerCase(),
    // 35 MB: most mail services cap attachments near 25 MB, which base64 makes ≈ 34 MB (from memory).
    intakeMaxBytes: int("MAIL_INTAKE_MAX_BYTES", 35 * 1024 * 1024),
    /** Hour (0–23, OFFICE_TIME_ZONE) of the daily To review digest. */
    digestHour: hour("DIGEST_HOUR", 8),
  },
  jobs: {
    /** Run background workers inside this process (off for a web-only instance). */
    enabled: bool("JOBS_ENABLED", true),
    concurrency: int("JOBS_CONCURRENCY", 1),
    pollMs: int("JOBS_POLL_MS", 1000),
    /** A claimed job's lease; the worker renews it every third of that (a heartbeat), so a dead worker's job is taken over within one lease. */
    leaseSeconds: int("JOBS_LEASE_SECONDS", 30),
    maxAttempts: int("JOBS_MAX_ATTEMPTS", 5),
    retryBaseSeconds: int("JOBS_RETRY_BASE_SECONDS", 5),
    /** The longest wait between two attempts of a job (a mail server down for hours is retried every 15 minutes). */
    retryMaxSeconds: int("JOBS_RETRY_MAX_SECONDS", 900),
  },
};

export type Env = typeof env;

/** The secret that seals session cookies; refuses a short one outside development. */
export function sessionSecret(): string {
  const secret = env.session.secret;
  if (secret.length >= 32) return secret;
  if (env.production) {
    throw new Error(
      "SESSION_SECRET must be at least 32 characters in production. Set it (for example `openssl rand -hex 32`) and start again.",
    );
  }
  return "development-only-secret-not-for-production-use-000";
}
