import "server-only";
// Accounts: credential checks with lockout, and the small user object the screens need.
import { getDb } from "@/db";
import { env } from "@/lib/env";
import type { Role } from "@/lib/auth/permissions";
import { burnPasswordCheck, verifyPassword } from "@/lib/auth/password";

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

export async function checkCredentials(emailInput: string, password: string): Promise<SignInResult> {
  const db = getDb();
  const email = emailInput.trim().toLowerCase();
  const row = await db("users").where({ email }).first();
  if (!row || !row.active || !row.password_hash) {
    await burnPasswordCheck(password);
    return { ok: false, code: "wrong_credentials", message: WRONG };
  }
  const now = new Date();
  if (row.locked_until && new Date(row.locked_until) > now) {
    const until = new Date(row.locked_until);
    return { ok: false, code: "account_locked", message: lockedMessage(until), lockedUntil: until };
  }
  if (!(await verifyPassword(password, row.password_hash))) {
    await db("users").where({ id: row.id }).increment("failed_sign_ins", 1);
    const { failed_sign_ins: failures } = await db("users").where({ id: row.id }).first("failed_sign_ins");
    if (failures >= env.signIn.maxFailures) {
      const until = new Date(now.getTime() + env.signIn.lockMinutes * 60_000);
      await db("users").where({ id: row.id }).update({ locked_until: until, failed_sign_ins: 0 });
      return { ok: false, code: "account_locked", message: lockedMessage(until), lockedUntil: until };
    }
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
