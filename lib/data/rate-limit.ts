import "server-only";
// Rate limits kept in MariaDB, so every app instance counts against the same numbers. A rule
// allows `max` hits per subject (an e-mail address, a client address, a link, a person) in a
// fixed window that starts with the first hit. Counting is one upsert and one read inside a
// transaction that holds the row's lock, so parallel requests each see their own exact count:
// a burst of 30 against a limit of 5 lets exactly 5 through.
import crypto from "node:crypto";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { RateLimited } from "@/lib/errors";

export interface RateRule {
  name: string;
  max: number;
  windowSeconds: number;
  /** The sentence's subject: "Too many {what}." */
  what: string;
}

export { RateLimited };

// Old windows are deleted now and then by whichever instance counts; an hour past their end
// they can no longer matter.
const SWEEP_EVERY_MS = 10 * 60_000;
let lastSweep = 0;

function waitWords(seconds: number): string {
  if (seconds < 90) return `${seconds} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}

/** Counts `amount` hits and answers the count in this window and the seconds left in it. */
export async function countHits(rule: RateRule, subject: string, amount = 1): Promise<{ hits: number; retryAfterSeconds: number }> {
  const db = getDb();
  if (Date.now() - lastSweep > SWEEP_EVERY_MS) {
    lastSweep = Date.now();
    void db("rate_limits").where("window_ends_at", "<", db.raw("NOW(3) - INTERVAL 1 HOUR")).delete().catch(() => {});
  }
  return db.transaction(async (trx) => {
    await trx.raw(
      `INSERT INTO rate_limits (rule, subject, hits, window_ends_at) VALUES (?, ?, ?, NOW(3) + INTERVAL ? SECOND)
       ON DUPLICATE KEY UPDATE
         hits = IF(window_ends_at <= NOW(3), VALUES(hits), hits + VALUES(hits)),
         window_ends_at = IF(window_ends_at <= NOW(3), VALUES(window_ends_at), window_ends_at)`,
      [rule.name, subject.slice(0, 191), amount, rule.windowSeconds],
    );
    const row = await trx("rate_limits")
      .where({ rule: rule.name, subject: subject.slice(0, 191) })
      .first("hits", trx.raw("TIMESTAMPDIFF(SECOND, NOW(3), window_ends_at) AS seconds_left"));
    return { hits: Number(row.hits), retryAfterSeconds: Math.max(1, Number(row.seconds_left) + 1) };
  });
}

/** Counts a hit; past the rule's limit throws 429 with Retry-After and a sentence. */
export async function enforceRateLimit(rule: RateRule, subject: string, amount = 1): Promise<void> {
  const { hits, retryAfterSeconds } = await countHits(rule, subject, amount);
  if (hits > rule.max) {
    throw new RateLimited(retryAfterSeconds, `Too many ${rule.what}. Wait ${waitWords(retryAfterSeconds)} and try again; nothing was changed.`);
  }
}

/** Gives a hit back (a sign-in that succeeded is not a failure). */
export async function refundHit(rule: RateRule, subject: string): Promise<void> {
  await getDb()("rate_limits")
    .where({ rule: rule.name, subject: subject.slice(0, 191) })
    .where("hits", ">", 0)
    .where("window_ends_at", ">", getDb().raw("NOW(3)"))
    .decrement("hits", 1);
}

const HOUR = 3600;

/** The rules, from configuration (README › Configuration). */
export const RATE_RULES = {
  signInAddress: (): RateRule => ({
    name: "sign_in_address",
    max: env.signIn.addressMaxFailures,
    windowSeconds: env.signIn.lockMinutes * 60,
    what: "wrong sign-ins from your network",
  }),
  resetRequestAccount: (): RateRule => ({ name: "reset_request_account", max: env.limits.resetRequestsPerAccount, windowSeconds: HOUR, what: "password-reset requests for this address" }),
  linkAddress: (): RateRule => ({ name: "link_address", max: env.limits.linkAttemptsPerAddress, windowSeconds: HOUR, what: "password requests from your network" }),
  link: (): RateRule => ({ name: "link", max: env.limits.attemptsPerLink, windowSeconds: HOUR, what: "attempts with this link" }),
  uploads: (): RateRule => ({ name: "uploads_user", max: env.limits.uploadsPerMinute, windowSeconds: 60, what: "uploads from your account in the last minute" }),
};

/** Forgot password: per address asked for (known or not, alike) and per client address. */
export async function limitResetRequest(email: string, address: string): Promise<void> {
  await enforceRateLimit(RATE_RULES.linkAddress(), address);
  await enforceRateLimit(RATE_RULES.resetRequestAccount(), email.trim().toLowerCase());
}

/** Choosing a password through a one-time link: per client address and per link (by its SHA-256; the link itself is never stored). */
export async function limitLinkAttempt(token: string, address: string): Promise<void> {
  await enforceRateLimit(RATE_RULES.linkAddress(), address);
  await enforceRateLimit(RATE_RULES.link(), crypto.createHash("sha256").update(token).digest("hex"));
}
