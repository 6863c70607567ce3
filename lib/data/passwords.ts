import "server-only";
// Choosing a password through a one-time link: accepting an invitation, or a forgotten password.
// Either ends every session the person had (the session epoch moves on), clears a lockout, and
// the person then signs in with the new password.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { AppError, badInput } from "@/lib/errors";
import { hashPassword } from "@/lib/auth/password";
import { checkPassword } from "@/lib/auth/password-rules";
import { consumeToken, issueToken, RESET_MINUTES, type TokenPurpose } from "@/lib/data/account-tokens";
import { completeJob, enqueueJob } from "@/lib/data/jobs";
import { queueMail } from "@/lib/data/mail-log";
import { appendSetupEvent } from "@/lib/data/setup-record";
import { RESET_REQUEST_JOB } from "@/lib/jobs/kinds";
import { resetMail } from "@/lib/mail/templates";

async function setPasswordThroughLink(token: string, password: string, purpose: TokenPurpose): Promise<{ email: string }> {
  return getDb().transaction(async (trx: Knex.Transaction) => {
    const userId = await consumeToken(trx, token, purpose); // a refusal below rolls this back: the link stays usable
    const user = await trx("users").where({ id: userId }).forUpdate().first("id", "email", "active", "password_hash");
    if (!user.active) throw new AppError(410, "account_deactivated", "This account has been deactivated. Ask an admin of your office if you need it back.");
    if (purpose === "invitation" && user.password_hash) {
      throw new AppError(410, "link_used", "This invitation was already accepted. Sign in with your password, or use Forgot your password? on the sign-in page.");
    }
    const problem = checkPassword(password, user.email);
    if (problem) throw badInput(problem);
    await trx("users")
      .where({ id: userId })
      .update({ password_hash: await hashPassword(password), failed_sign_ins: 0, locked_until: null, session_epoch: trx.raw("session_epoch + 1") });
    await appendSetupEvent(trx, { userId, entity: "user", entityId: userId, action: purpose === "invitation" ? "invitation_accepted" : "password_reset" });
    return { email: user.email };
  });
}

export function acceptInvitation(token: string, password: string) {
  return setPasswordThroughLink(token, password, "invitation");
}

export function resetPassword(token: string, password: string) {
  return setPasswordThroughLink(token, password, "reset");
}

export const FORGOT_ANSWER =
  "If that address has a Foldwright account, a link to choose a new password is on its way. It works once, for one hour. Check your spam folder if nothing arrives in a few minutes.";

/**
 * A forgotten password: the request only queues a job, whether or not the address has an
 * account, so the answer and its timing are the same for both; the job decides and sends.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  await enqueueJob(RESET_REQUEST_JOB, null, { email: email.trim().toLowerCase() });
}

/**
 * The job's half, written with the job's completion: a link for an active account (an invited
 * one too: it then chooses its first password). False when the address has none.
 */
export async function sendResetLinkIfKnown(jobId: number, workerId: string, email: string): Promise<boolean> {
  return getDb().transaction(async (trx) => {
    if (!(await completeJob(trx, jobId, workerId))) throw new Error("this job's lease was lost; another worker has it");
    return queueResetLink(trx, email);
  });
}

async function queueResetLink(trx: Knex.Transaction, email: string): Promise<boolean> {
  const user = await trx("users").where({ email, active: true }).first("id", "email", "name");
  if (!user) return false;
  const token = await issueToken(trx, user.id, "reset", null);
  await queueMail(trx, { kind: "reset", userId: user.id, mail: resetMail(user.email, user.name, `${env.origin}/reset-password/${token}`, RESET_MINUTES) });
  return true;
}
