import "server-only";
// One-time links (invitation, password reset): stored hashed, used once, replaced by a newer
// link of the same purpose. Consuming happens inside the caller's transaction with the row locked,
// so two clicks on one link never both succeed.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { hashToken, newToken } from "@/lib/auth/tokens";

export type TokenPurpose = "invitation" | "reset";

export const INVITATION_HOURS = 72;
export const RESET_MINUTES = 60;

const WHAT: Record<TokenPurpose, { name: string; again: string }> = {
  invitation: { name: "invitation link", again: "Ask an admin of your office to send a new invitation." },
  reset: { name: "password reset link", again: "Ask for a new one from the sign-in page (Forgot your password?)." },
};

/** Issues a new link for the person, retiring the earlier ones of that purpose. Answers the raw token. */
export async function issueToken(trx: Knex.Transaction, userId: number, purpose: TokenPurpose, createdBy: number | null): Promise<string> {
  const minutes = purpose === "invitation" ? INVITATION_HOURS * 60 : RESET_MINUTES;
  await trx("account_tokens").where({ user_id: userId, purpose }).whereNull("used_at").update({ used_at: trx.raw("NOW(3)") });
  const { token, hash } = newToken();
  await trx("account_tokens").insert({
    user_id: userId,
    purpose,
    token_hash: hash,
    expires_at: trx.raw("NOW(3) + INTERVAL ? MINUTE", [minutes]),
    created_by: createdBy,
  });
  return token;
}

async function findUsable(db: Knex | Knex.Transaction, token: string, purpose: TokenPurpose, lock: boolean): Promise<{ id: number; user_id: number }> {
  const q = db("account_tokens")
    .where({ token_hash: hashToken(token), purpose })
    .first("id", "user_id", "used_at", db.raw("expires_at < NOW(3) AS expired"));
  const row = await (lock ? q.forUpdate() : q);
  const what = WHAT[purpose];
  if (!row) throw new AppError(404, "link_unknown", `This ${what.name} is not valid. Check that you opened the whole link from the e-mail. ${what.again}`);
  if (row.used_at) throw new AppError(410, "link_used", `This ${what.name} has already been used (or a newer one was sent). ${what.again}`);
  if (Number(row.expired)) throw new AppError(410, "link_expired", `This ${what.name} has expired. ${what.again}`);
  return row;
}

/** Marks the link used and answers its person; a sentence (404 or 410) when it cannot be used. */
export async function consumeToken(trx: Knex.Transaction, token: string, purpose: TokenPurpose): Promise<number> {
  const row = await findUsable(trx, token, purpose, true);
  await trx("account_tokens").where({ id: row.id }).update({ used_at: trx.raw("NOW(3)") });
  return row.user_id;
}

/** Whether a link can still be used, without using it (the page shows the form or the sentence). */
export async function checkLink(token: string, purpose: TokenPurpose, db: Knex = getDb()): Promise<{ ok: true; email: string; name: string } | { ok: false; message: string }> {
  try {
    const row = await findUsable(db, token, purpose, false);
    const user = await db("users").where({ id: row.user_id }).first("email", "name");
    return { ok: true, email: user.email, name: user.name };
  } catch (e) {
    if (e instanceof AppError) return { ok: false, message: e.message };
    throw e;
  }
}
