// Background workers: claim jobs from the MariaDB queue with bounded concurrency, keep their
// leases alive while they run, retry failures with backoff. Safe to run in any number of
// processes at once (web instances or `npm run worker`).
import crypto from "node:crypto";
import os from "node:os";
import { claimJobs, extendLease, failJob, sweepExhaustedJobs, type Job } from "@/lib/data/jobs";

// Three heartbeats per lease: two can be lost (a slow query, a busy event loop) before the lease runs out.
const HEARTBEATS_PER_LEASE = 3;

export interface JobHandler {
  /** Does the work; must finish by calling completeJob inside its results transaction. */
  run(job: Job, workerId: string): Promise<void>;
  /** Called once when a job is given up for good (attempts exhausted). */
  giveUp?(job: Job, error: string): Promise<void>;
}

export interface WorkerOptions {
  handlers: Record<string, JobHandler>;
  concurrency: number;
  pollMs: number;
  leaseSeconds: number;
  log?: (line: string) => void;
}

export interface Workers {
  workerId: string;
  /** Resolves when every running job has settled. */
  stop(): Promise<void>;
}

export function startWorkers(options: WorkerOptions): Workers {
  const workerId = `${os.hostname()}:${process.pid}:${crypto.randomBytes(3).toString("hex")}`;
  const kinds = Object.keys(options.handlers);
  const running = new Set<Promise<void>>();
  const log = options.log ?? ((line: string) => console.log(`[jobs] ${line}`));
  let stopped = false;
  let wake: (() => void) | null = null;

  async function runOne(job: Job): Promise<void> {
    const handler = options.handlers[job.kind];
    const heartbeat = setInterval(
      () => void extendLease(job.id, workerId, options.leaseSeconds).catch(() => {}),
      Math.max(1000, (options.leaseSeconds * 1000) / HEARTBEATS_PER_LEASE),
    );
    try {
      await handler.run(job, workerId);
    } catch (e) {
      const message = e instanceof Error ? e.message : String(e);
      log(`job ${job.id} (${job.kind}) attempt ${job.attempts} failed: ${message}`);
      const gaveUp = await failJob(job, workerId, message).catch(() => false);
      if (gaveUp) await handler.giveUp?.(job, message).catch(() => {});
    } finally {
      clearInterval(heartbeat);
    }
  }

  async function loop(): Promise<void> {
    let sweeps = 0;
    let idle = options.pollMs;
    while (!stopped) {
      try {
        if (sweeps++ % 30 === 0) {
          for (const job of await sweepExhaustedJobs(kinds)) await options.handlers[job.kind]?.giveUp?.(job, "The worker stopped before finishing, too many times.");
        }
        const free = options.concurrency - running.size;
        const jobs = free > 0 ? await claimJobs(workerId, kinds, free, options.leaseSeconds) : [];
        for (const job of jobs) {
          const p = runOne(job).finally(() => {
            running.delete(p);
            wake?.();
          });
          running.add(p);
        }
        if (jobs.length > 0 && running.size < options.concurrency) continue;
        idle = options.pollMs;
      } catch (e) {
        log(`queue unavailable, trying again shortly: ${e instanceof Error ? e.message : e}`);
        idle = Math.min(30_000, Math.max(idle * 2, 2000)); // back off while the database is away
      }
      await new Promise<void>((resolve) => {
        wake = resolve;
        setTimeout(resolve, idle);
      });
      wake = null;
    }
  }

  const loopDone = loop();
  return {
    workerId,
    async stop() {
      stopped = true;
      wake?.();
      await loopDone;
      await Promise.allSettled([...running]);
    },
  };
}
