import "server-only";
// Outgoing mail: a mail_log row per message and a job that sends it, written in the caller's
// transaction, so a request never waits on SMTP and a message is queued exactly when the change
// that causes it commits. A server that is down delays the message (the job retries with
// backoff) without losing it.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { completeJob, enqueueJob } from "@/lib/data/jobs";
import { MAIL_JOB } from "@/lib/jobs/kinds";
import { sealMail, unsealMail } from "@/lib/mail/seal";
import type { OutgoingMail } from "@/lib/mail/transport";

export type MailKind = "invitation" | "reset" | "digest" | "retrain_alert" | "scan_receipt";

export interface QueueMailInput {
  kind: MailKind;
  mail: OutgoingMail;
  userId?: number | null;
  /** A key that may be queued only once (one digest per person per day); a repeat is skipped. */
  dedupeKey?: string;
}

/** Queues a message; answers its mail_log id, or null when its dedupe key was already queued. */
export async function queueMail(db: Knex | Knex.Transaction, input: QueueMailInput): Promise<number | null> {
  const row = {
    kind: input.kind,
    to_address: input.mail.to,
    user_id: input.userId ?? null,
    subject: input.mail.subject.slice(0, 300),
    sealed: await sealMail(input.mail),
    dedupe_key: input.dedupeKey ?? null,
  };
  const inserted = input.dedupeKey ? await db("mail_log").insert(row).onConflict("dedupe_key").ignore() : await db("mail_log").insert(row);
  const id = Number(inserted[0]);
  if (!id) return null;
  await enqueueJob(MAIL_JOB, null, { mailId: id }, db, { maxAttempts: env.mail.maxAttempts });
  return id;
}

export async function openQueuedMail(id: number): Promise<OutgoingMail | null> {
  const row = await getDb()("mail_log").where({ id }).first("state", "sealed");
  if (!row || row.state === "sent" || !row.sealed) return null;
  return unsealMail(row.sealed);
}

/** Records the message as sent together with the job's completion (once, even if two workers ran it). */
export async function completeMailJob(jobId: number, workerId: string, mailId: number | null, messageId = ""): Promise<void> {
  await getDb().transaction(async (trx) => {
    if (!(await completeJob(trx, jobId, workerId))) throw new Error("this job's lease was lost; another worker has it");
    if (mailId === null) return;
    await trx("mail_log")
      .where({ id: mailId })
      .update({ state: "sent", message_id: messageId.slice(0, 250), sent_at: trx.raw("NOW(3)"), sealed: null, last_error: null, attempts: trx.raw("attempts + 1") });
  });
}

/** An attempt failed: the row stays queued with the reason until the next attempt, or is failed for good. */
export async function noteMailAttemptFailed(id: number, error: string, final: boolean, countAttempt = true): Promise<void> {
  const db = getDb();
  await db("mail_log")
    .where({ id })
    .whereNot("state", "sent")
    .update({ state: final ? "failed" : "queued", last_error: error.slice(0, 1000), ...(countAttempt ? { attempts: db.raw("attempts + 1") } : {}) });
}

export interface OutboxRow {
  id: number;
  kind: string;
  to: string;
  subject: string;
  state: "queued" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  messageId: string | null;
  createdAt: string;
  sentAt: string | null;
}

export async function listOutbox(page: number, pageSize: number): Promise<{ items: OutboxRow[]; total: number }> {
  const db = getDb();
  const [{ total }] = await db("mail_log").count({ total: "id" });
  const rows = await db("mail_log")
    .orderBy("id", "desc")
    .limit(pageSize)
    .offset((page - 1) * pageSize)
    .select("id", "kind", "to_address", "subject", "state", "attempts", "last_error", "message_id", "created_at", "sent_at");
  return {
    total: Number(total),
    items: rows.map((r) => ({
      id: Number(r.id),
      kind: r.kind,
      to: r.to_address,
      subject: r.subject,
      state: r.state,
      attempts: r.attempts,
      lastError: r.last_error,
      messageId: r.message_id,
      createdAt: new Date(r.created_at).toISOString(),
      sentAt: r.sent_at ? new Date(r.sent_at).toISOString() : null,
    })),
  };
}
