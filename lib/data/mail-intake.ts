import "server-only";
// Scans that arrive by e-mail. The listener (lib/inbox) keeps the raw message in the bucket and
// its row before it answers 250, so nothing accepted is lost; a job then turns each attachment
// into a document through Intake's own function, records each one's fate, sends the sender a
// receipt, and removes the raw message only once every attachment is settled. Storage or the
// database being away fails the job, which is tried again with the raw message still kept.
import crypto from "node:crypto";
import { getDb } from "@/db";
import { completeJob, enqueueJob, type Job } from "@/lib/data/jobs";
import { fileEmailAttachment } from "@/lib/data/mail-intake-file";
import { queueMail } from "@/lib/data/mail-log";
import type { CurrentUser } from "@/lib/data/users";
import { MAIL_INTAKE_JOB } from "@/lib/jobs/kinds";
import { parseScanMessage } from "@/lib/mail/parse-scan";
import { scanReceiptMail, type ReceiptLine } from "@/lib/mail/templates";
import { deleteObject, getObjectBytes, putObject } from "@/storage/s3";

export interface IncomingMessage {
  from: string;
  uploader: CurrentUser;
  raw: Buffer;
  subject: string | null;
  attachmentCount: number;
}

/** Keeps the raw message and queues its filing; answers the message's id. Throws when storage or the database is away. */
export async function keepIncomingMessage(m: IncomingMessage): Promise<number> {
  const now = new Date();
  const key = `inbox/${now.getUTCFullYear()}/${String(now.getUTCMonth() + 1).padStart(2, "0")}/${crypto.randomUUID()}.eml`;
  await putObject(key, m.raw, { contentType: "message/rfc822", metadata: { "envelope-from": encodeURIComponent(m.from) } });
  try {
    return await getDb().transaction(async (trx) => {
      const [id] = await trx("mail_intake_messages").insert({
        envelope_from: m.from,
        subject: m.subject?.slice(0, 300) ?? null,
        uploaded_by: m.uploader.id,
        raw_key: key,
        size_bytes: m.raw.byteLength,
        attachment_count: m.attachmentCount,
      });
      await enqueueJob(MAIL_INTAKE_JOB, null, { messageId: id }, trx);
      return id as number;
    });
  } catch (e) {
    await deleteObject(key).catch(() => {}); // the sender is told to try later: keep no orphan
    throw e;
  }
}

const TRY_AGAIN = 503;

/** The job: file every attachment not yet settled, then the receipt and the clean-up. */
export async function fileIncomingMessage(job: Job, workerId: string): Promise<void> {
  const db = getDb();
  const messageId = Number((job.payload as { messageId?: unknown } | null)?.messageId);
  const message = await db("mail_intake_messages").where({ id: messageId }).first();
  if (!message) throw new Error(`incoming message ${messageId} is gone`);
  if (message.state === "done") {
    await db.transaction(async (trx) => void (await completeJob(trx, job.id, workerId)));
    return;
  }
  const uploader: CurrentUser = await db("users").where({ id: message.uploaded_by }).first("id", "email", "name", "role");
  const parsed = await parseScanMessage(await getObjectBytes(message.raw_key)); // storage away → retried
  const settled = new Set((await db("mail_intake_attachments").where({ message_id: messageId }).select("part_index")).map((r) => r.part_index));
  for (const [index, file] of parsed.attachments.entries()) {
    if (settled.has(index)) continue;
    const result = await fileEmailAttachment(uploader, file.name, file.bytes);
    if (result.status === "rejected" && result.httpStatus === TRY_AGAIN) throw new Error(`${file.name}: ${result.error.message}`);
    await db("mail_intake_attachments").insert({
      message_id: messageId,
      part_index: index,
      file_name: result.name.slice(0, 255),
      fate: result.status,
      document_id: result.status === "reading" ? result.id : null,
      code: result.status === "rejected" ? result.error.code : null,
      message: (result.status === "rejected" ? result.error.message : result.status === "duplicate" ? result.duplicateOf.message : `Taken in as document #${result.id}; it is being read.`).slice(0, 600),
    });
  }
  await finishIncomingMessage(job, workerId, messageId, message.envelope_from, message.subject);
  await deleteObject(message.raw_key).catch((e) => console.error(`[mail intake] could not remove ${message.raw_key}:`, e));
}

async function finishIncomingMessage(job: Job, workerId: string, messageId: number, from: string, subject: string | null) {
  await getDb().transaction(async (trx) => {
    if (!(await completeJob(trx, job.id, workerId))) throw new Error("this job's lease was lost; another worker has it");
    const rows = await trx("mail_intake_attachments").where({ message_id: messageId }).orderBy("part_index").select("file_name", "fate", "message");
    await trx("mail_intake_messages").where({ id: messageId }).update({ state: "done", raw_key: null, done_at: trx.raw("NOW(3)") });
    const person = await trx("users").where({ email: from }).first("id", "notify_scan_receipt");
    if (person && !person.notify_scan_receipt) return; // the sender switched receipts off
    const lines: ReceiptLine[] = rows.map((r) => ({ name: r.file_name, fate: r.fate, sentence: r.message }));
    await queueMail(trx, { kind: "scan_receipt", userId: person?.id ?? null, dedupeKey: `receipt:${messageId}`, mail: scanReceiptMail(from, subject, lines) });
  });
}
