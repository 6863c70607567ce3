// The "mail_intake" job: turn a received message's attachments into documents (lib/data/mail-intake.ts).
import { fileIncomingMessage } from "@/lib/data/mail-intake";
import type { JobHandler } from "@/lib/jobs/worker";

export const mailIntakeJob: JobHandler = {
  run: (job, workerId) => fileIncomingMessage(job, workerId),
};
