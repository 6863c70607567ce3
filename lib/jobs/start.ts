// Starts this process's background workers (called from instrumentation.ts and `npm run worker`).
import { env } from "@/lib/env";
import { readJob } from "@/lib/jobs/read-job";
import { READ_JOB } from "@/lib/jobs/kinds";
import { startWorkers, type Workers } from "@/lib/jobs/worker";

const globalForJobs = globalThis as unknown as { foldwrightWorkers?: Workers };

export function startBackgroundWork(): Workers | undefined {
  if (!env.jobs.enabled) return undefined;
  if (!globalForJobs.foldwrightWorkers) {
    globalForJobs.foldwrightWorkers = startWorkers({
      handlers: { [READ_JOB]: readJob },
      concurrency: env.jobs.concurrency,
      pollMs: env.jobs.pollMs,
      leaseSeconds: env.jobs.leaseSeconds,
    });
  }
  return globalForJobs.foldwrightWorkers;
}

export async function stopBackgroundWork(): Promise<void> {
  const workers = globalForJobs.foldwrightWorkers;
  globalForJobs.foldwrightWorkers = undefined;
  await workers?.stop();
}
