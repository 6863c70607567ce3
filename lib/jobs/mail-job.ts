// The "mail" job: send one queued message over SMTP. A refusal or a server that is away throws,
// and the queue tries again with backoff (capped at JOBS_RETRY_MAX_SECONDS) up to MAIL_MAX_ATTEMPTS;
// the mail_log row says "queued" with the last error meanwhile, "failed" only at the very end.
import type { Transporter } from "nodemailer";
import { completeMailJob, noteMailAttemptFailed, openQueuedMail } from "@/lib/data/mail-log";
import { createMailTransport, sendMail } from "@/lib/mail/transport";
import type { JobHandler } from "@/lib/jobs/worker";

function mailIdOf(payload: unknown): number {
  const id = Number((payload as { mailId?: unknown } | null)?.mailId);
  if (!Number.isInteger(id) || id <= 0) throw new Error("the mail job names no message");
  return id;
}

/** The handler; the transport is a parameter so a test can point it at a server it stops and starts. */
// RFC 5321 §4.2.1: a 5yz reply is a permanent refusal (no such mailbox, policy), so trying the same
// message again cannot help; a 4yz reply or no answer at all is worth another attempt later.
function isPermanent(e: unknown): boolean {
  const code = Number((e as { responseCode?: unknown } | null)?.responseCode);
  return code >= 500 && code < 600;
}

/** The handler; the transport is a parameter so a test can point it at a server it stops and starts. */
export function makeMailJob(transport: () => Transporter = sharedTransport): JobHandler {
  return {
    async run(job, workerId) {
      const mailId = mailIdOf(job.payload);
      let mail;
      try {
        mail = await openQueuedMail(mailId);
      } catch (e) {
        await noteMailAttemptFailed(mailId, e instanceof Error ? e.message : String(e), true);
        return completeMailJob(job.id, workerId, null); // a seal that cannot be opened will not open later
      }
      if (!mail) return completeMailJob(job.id, workerId, null); // already sent by an earlier attempt
      let messageId: string;
      try {
        messageId = await sendMail(transport(), mail);
      } catch (e) {
        const reason = e instanceof Error ? e.message : String(e);
        const permanent = isPermanent(e);
        await noteMailAttemptFailed(mailId, permanent ? `The mail server refused this message: ${reason}` : reason, permanent || job.attempts >= job.max_attempts);
        if (permanent) return completeMailJob(job.id, workerId, null);
        throw e;
      }
      await completeMailJob(job.id, workerId, mailId, messageId);
    },
    async giveUp(job, error) {
      await noteMailAttemptFailed(mailIdOf(job.payload), `Gave up after ${job.attempts} attempts: ${error}`, true, false);
    },
  };
}

let transport: Transporter | null = null;
function sharedTransport(): Transporter {
  transport ??= createMailTransport();
  return transport;
}

export const mailJob = makeMailJob();
