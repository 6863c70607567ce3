// Starts this process's background work (called from instrumentation.ts and `npm run worker`):
// one pool for reading and suggesting (JOBS_CONCURRENCY at a time), one for training (one at a
// time, so a long training never holds up the day's reading), one for mail (sending, password
// reset requests, scans by e-mail: quick jobs that must not wait behind OCR), the nightly
// retraining, the daily digest, the SMTP listener for scans by e-mail, one pool for archive
// imports (storing an archive's files one by one while the first pool reads those already
// stored), and (once at start) the queueing of "tokenize" jobs for documents whose term counts
// are missing or outdated.
import { env } from "@/lib/env";
import { readJob } from "@/lib/jobs/read-job";
import { IMPORT_JOB, MAIL_INTAKE_JOB, MAIL_JOB, READ_JOB, RESET_REQUEST_JOB, SUGGEST_JOB, TOKENIZE_JOB, TRAIN_JOB } from "@/lib/jobs/kinds";
import { tokenizeJob } from "@/lib/jobs/tokenize-job";
import { queueRetokenizing } from "@/lib/data/document-terms";
import { importJob } from "@/lib/jobs/import-job";
import { mailIntakeJob } from "@/lib/jobs/mail-intake-job";
import { mailJob } from "@/lib/jobs/mail-job";
import { resetRequestJob } from "@/lib/jobs/reset-request-job";
import { suggestJob } from "@/lib/jobs/suggest-job";
import { trainJob } from "@/lib/jobs/train-job";
import { scheduleDailyDigest, scheduleNightlyRetrain } from "@/lib/jobs/schedule";
import { startWorkers, type Workers } from "@/lib/jobs/worker";
import { startIntakeListener, type IntakeListener } from "@/lib/inbox/listener";

interface Background {
  documents: Workers;
  training: Workers;
  mail: Workers;
  imports: Workers;
  nightly: { stop(): void } | null;
  digest: { stop(): void } | null;
  listener: Promise<IntakeListener | null>;
}

// Mail jobs wait on the network, not the CPU: two at a time keeps a slow server from holding up the rest.
const MAIL_CONCURRENCY = 2;

const globalForJobs = globalThis as unknown as { foldwrightBackground?: Background };

async function listenForScans(): Promise<IntakeListener | null> {
  if (!env.mail.intakeEnabled) return null;
  try {
    const listener = await startIntakeListener();
    console.log(`[mail intake] listening on 127.0.0.1:${listener.port} for ${env.mail.intakeAddress}`);
    return listener;
  } catch (e) {
    // Another process of this machine (a second instance, `npm run worker`) already listens: one is enough.
    console.error(`[mail intake] not listening on 127.0.0.1:${env.mail.intakePort}: ${e instanceof Error ? e.message : e}`);
    return null;
  }
}

export function startBackgroundWork(): Background | undefined {
  if (!env.jobs.enabled) return undefined;
  if (globalForJobs.foldwrightBackground) return globalForJobs.foldwrightBackground;
  globalForJobs.foldwrightBackground = {
    documents: startWorkers({
      handlers: { [READ_JOB]: readJob, [SUGGEST_JOB]: suggestJob },
      concurrency: env.jobs.concurrency,
      pollMs: env.jobs.pollMs,
      leaseSeconds: env.jobs.leaseSeconds,
    }),
    // Re-tokenising (a new tokenizer version, rows a seed wrote) waits with training, off the reading pool.
    training: startWorkers({ handlers: { [TRAIN_JOB]: trainJob, [TOKENIZE_JOB]: tokenizeJob }, concurrency: 1, pollMs: env.jobs.pollMs * 2, leaseSeconds: env.jobs.leaseSeconds }),
    mail: startWorkers({
      handlers: { [MAIL_JOB]: mailJob, [RESET_REQUEST_JOB]: resetRequestJob, [MAIL_INTAKE_JOB]: mailIntakeJob },
      concurrency: MAIL_CONCURRENCY,
      pollMs: env.jobs.pollMs,
      leaseSeconds: env.jobs.leaseSeconds,
    }),
    imports: startWorkers({ handlers: { [IMPORT_JOB]: importJob }, concurrency: 1, pollMs: env.jobs.pollMs, leaseSeconds: env.jobs.leaseSeconds }),
    nightly: scheduleNightlyRetrain(),
    digest: scheduleDailyDigest(),
    listener: listenForScans(),
  };
  queueRetokenizing().then(
    (n) => n > 0 && console.log(`[tokenize] ${n} document${n === 1 ? "" : "s"} queued to be tokenised again`),
    (e) => console.error("[tokenize] could not queue re-tokenising:", e),
  );
  return globalForJobs.foldwrightBackground;
}

export async function stopBackgroundWork(): Promise<void> {
  const bg = globalForJobs.foldwrightBackground;
  globalForJobs.foldwrightBackground = undefined;
  bg?.nightly?.stop();
  bg?.digest?.stop();
  await (await bg?.listener)?.stop();
  await Promise.all([bg?.documents.stop(), bg?.training.stop(), bg?.mail.stop(), bg?.imports.stop()]);
}
