// The "reset_request" job: a forgotten-password request, answered by mail only when the address
// belongs to an active account. The request itself answered the same sentence either way.
import { sendResetLinkIfKnown } from "@/lib/data/passwords";
import type { JobHandler } from "@/lib/jobs/worker";

export const resetRequestJob: JobHandler = {
  async run(job, workerId) {
    const email = String((job.payload as { email?: unknown } | null)?.email ?? "");
    await sendResetLinkIfKnown(job.id, workerId, email);
  },
};
