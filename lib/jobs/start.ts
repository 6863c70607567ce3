// Starts this process's background work (called from instrumentation.ts and `npm run worker`):
// one pool for reading and suggesting (JOBS_CONCURRENCY at a time), one for training (one at a
// time, so a long training never holds up the day's reading), and the nightly retraining.
import { env } from "@/lib/env";
import { readJob } from "@/lib/jobs/read-job";
import { READ_JOB, SUGGEST_JOB, TRAIN_JOB } from "@/lib/jobs/kinds";
import { suggestJob } from "@/lib/jobs/suggest-job";
import { trainJob } from "@/lib/jobs/train-job";
import { scheduleNightlyRetrain } from "@/lib/jobs/schedule";
import { startWorkers, type Workers } from "@/lib/jobs/worker";

interface Background {
  documents: Workers;
  training: Workers;
  nightly: { stop(): void } | null;
}

const globalForJobs = globalThis as unknown as { foldwrightBackground?: Background };

export function startBackgroundWork(): Background | undefined {
  if (!env.jobs.enabled) return undefined;
  globalForJobs.foldwrightBackground ??= {
    documents: startWorkers({
      handlers: { [READ_JOB]: readJob, [SUGGEST_JOB]: suggestJob },
      concurrency: env.jobs.concurrency,
      pollMs: env.jobs.pollMs,
      leaseSeconds: env.jobs.leaseSeconds,
    }),
    training: startWorkers({ handlers: { [TRAIN_JOB]: trainJob }, concurrency: 1, pollMs: env.jobs.pollMs * 2, leaseSeconds: env.jobs.leaseSeconds }),
    nightly: scheduleNightlyRetrain(),
  };
  return globalForJobs.foldwrightBackground;
}

export async function stopBackgroundWork(): Promise<void> {
  const bg = globalForJobs.foldwrightBackground;
  globalForJobs.foldwrightBackground = undefined;
  bg?.nightly?.stop();
  await Promise.all([bg?.documents.stop(), bg?.training.stop()]);
}
