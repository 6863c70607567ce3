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
export function makeMailJob(transport: () => Transporter = sharedTransport): JobHandler {
  return {
    async run(job, workerId) {
      const mailId = mailIdOf(job.payload);
      const mail = await openQueuedMail(mailId);
      if (!mail) return completeMailJob(job.id, workerId, null); // already sent by an earlier attempt
      let messageId: string;
      try {
        messageId = await sendMail(transport(), mail);
      } catch (e) {
        const reason = e instanceof Error ? e.message : String(e);
        await noteMailAttemptFailed(mailId, reason, job.attempts >= job.max_attempts);
        throw e;
      }
      await completeMailJob(job.id, workerId, mailId, messageId);
    },
    async giveUp(job, error) {
      await noteMailAttemptFailed(mailIdOf(job.payload), `Gave up after ${job.attempts} attempts: ${error}`, true);
    },
  };
}

let transport: Transporter | null = null;
function sharedTransport(): Transporter {
  transport ??= createMailTransport();
  return transport;
}

export const mailJob = makeMailJob();
