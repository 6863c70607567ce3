import "server-only";
// Accounts: credential checks with lockout, and the small user object the screens need.
import { getDb } from "@/db";
import { env } from "@/lib/env";
import type { Role } from "@/lib/auth/permissions";
import { burnPasswordCheck, verifyPassword } from "@/lib/auth/password";
import { enforceRateLimit, RATE_RULES, refundHit } from "@/lib/data/rate-limit";

export interface CurrentUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/**
 * Foldwright itself, for its own background reads (suggesting, training, the start command):
 * inside every wall, like an admin. Never a session, and never written as anyone's id — user 0
 * does not exist, so a write in its name fails on the foreign key.
 */
export const FOLDWRIGHT: CurrentUser = Object.freeze({ id: 0, email: "", name: "Foldwright", role: "admin" as const });

interface UserRow extends CurrentUser {
  session_epoch: number;
}

export type SignInResult =
  | { ok: true; user: CurrentUser; epoch: number }
  | { ok: false; code: "wrong_credentials" | "account_locked"; message: string; lockedUntil?: Date };

const WRONG = "That e-mail and password do not match an account. Check both and try again.";

function lockedMessage(until: Date): string {
  const time = until.toISOString().slice(11, 16);
  return `This account is locked after ${env.signIn.maxFailures} wrong passwords. Try again after ${time} UTC, or ask an admin to unlock it.`;
}

/**
 * Checks an e-mail and password, counting failures per account (the lockout) and per client
 * address (lib/data/rate-limit.ts). A guess is reserved before the hash is checked: the UPDATE
 * succeeds only while fewer than SIGN_IN_MAX_FAILURES are counted and the account is not
 * locked, and its affected-row count decides whether the hash is checked at all — so a burst of
 * parallel wrong passwords checks at most that many guesses. A right password gives its
 * reservation back.
 */
export async function checkCredentials(emailInput: string, password: string, address: string): Promise<SignInResult> {
  const rule = RATE_RULES.signInAddress();
  await enforceRateLimit(rule, address);
  const result = await checkAccount(emailInput, password);
  if (result.ok) await refundHit(rule, address);
  return result;
}

async function checkAccount(emailInput: string, password: string): Promise<SignInResult> {
  const db = getDb();
  const email = emailInput.trim().toLowerCase();
  const max = env.signIn.maxFailures;
  const row = await db("users").where({ email }).first();
  if (!row || !row.active || !row.password_hash) {
    await burnPasswordCheck(password);
    return { ok: false, code: "wrong_credentials", message: WRONG };
  }
  const now = new Date();
  const reserved = await db("users")
    .where({ id: row.id })
    .where("failed_sign_ins", "<", max)
    .where((q) => q.whereNull("locked_until").orWhere("locked_until", "<=", now))
    .increment("failed_sign_ins", 1);
  if (reserved === 0) {
    const fresh = await db("users").where({ id: row.id }).first("locked_until");
    // Locked, or the last allowed guesses are being checked right now (the lock follows).
    const until = fresh?.locked_until && new Date(fresh.locked_until) > now ? new Date(fresh.locked_until) : new Date(now.getTime() + env.signIn.lockMinutes * 60_000);
    return { ok: false, code: "account_locked", message: lockedMessage(until), lockedUntil: until };
  }
  if (!(await verifyPassword(password, row.password_hash))) {
    const until = new Date(Date.now() + env.signIn.lockMinutes * 60_000);
    const locked = await db("users").where({ id: row.id }).where("failed_sign_ins", ">=", max).update({ locked_until: until, failed_sign_ins: 0 });
    if (locked) return { ok: false, code: "account_locked", message: lockedMessage(until), lockedUntil: until };
    return { ok: false, code: "wrong_credentials", message: WRONG };
  }
  await db("users").where({ id: row.id }).update({ failed_sign_ins: 0, locked_until: null, last_sign_in_at: now });
  return { ok: true, user: toCurrentUser(row), epoch: row.session_epoch };
}

function toCurrentUser(row: UserRow): CurrentUser {
  return { id: row.id, email: row.email, name: row.name, role: row.role };
}

/** The user behind a session, if the account is active and the session's epoch is current. */
export async function findSessionUser(id: number, epoch: number): Promise<CurrentUser | null> {
  const row: UserRow | undefined = await getDb()("users")
    .where({ id, active: true, session_epoch: epoch })
    .first("id", "email", "name", "role", "session_epoch");
  return row ? toCurrentUser(row) : null;
}

/** Ends every session of the user (sign-out, deactivation). */
export async function endUserSessions(id: number): Promise<void> {
  await getDb()("users").where({ id }).increment("session_epoch", 1);
}
