import "server-only";
// The job queue in MariaDB. Claims use SELECT … FOR UPDATE SKIP LOCKED so any number of
// processes can take work without taking the same job; a claimed job carries a lease, and a job
// whose worker died is taken again once its lease has run out. Times come from the database
// clock (NOW(3)) so app servers with skewed clocks agree.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { env } from "@/lib/env";

export interface Job {
  id: number;
  kind: string;
  document_id: number | null;
  payload: unknown;
  attempts: number;
  max_attempts: number;
}

export async function enqueueJob(
  kind: string,
  documentId: number | null,
  payload: unknown = null,
  trx: Knex | Knex.Transaction = getDb(),
  options: { maxAttempts?: number } = {},
): Promise<number> {
  const [id] = await trx("jobs").insert({
    kind,
    document_id: documentId,
    payload: payload === null ? null : JSON.stringify(payload),
    max_attempts: options.maxAttempts ?? env.jobs.maxAttempts,
  });
  return id;
}

export async function claimJobs(workerId: string, kinds: string[], limit: number, leaseSeconds: number): Promise<Job[]> {
  if (limit <= 0 || kinds.length === 0) return [];
  return getDb().transaction(async (trx): Promise<Job[]> => {
    const rows: { id: number }[] = await trx("jobs")
      .select("id")
      .whereIn("kind", kinds)
      .whereRaw("attempts < max_attempts")
      .where((q) =>
        q
          .where((w) => w.where("status", "queued").whereRaw("run_after <= NOW(3)"))
          .orWhere((w) => w.where("status", "running").whereRaw("leased_until < NOW(3)")),
      )
      .orderBy("id") // a primary-key scan locks only the rows it returns; a filesort would lock them all
      .limit(limit)
      .forUpdate()
      .skipLocked();
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.id);
    await trx("jobs")
      .whereIn("id", ids)
      .update({
        status: "running",
        attempts: trx.raw("attempts + 1"),
        leased_by: workerId,
        leased_until: trx.raw("NOW(3) + INTERVAL ? SECOND", [leaseSeconds]),
      });
    return trx("jobs").whereIn("id", ids).select("id", "kind", "document_id", "payload", "attempts", "max_attempts");
  });
}

/** Keeps a long job's lease alive; false when the job is no longer ours. */
export async function extendLease(id: number, workerId: string, leaseSeconds: number): Promise<boolean> {
  const n = await getDb()("jobs")
    .where({ id, leased_by: workerId, status: "running" })
    .update({ leased_until: getDb().raw("NOW(3) + INTERVAL ? SECOND", [leaseSeconds]) });
  return n === 1;
}

/**
 * Marks the job done inside the caller's transaction, only if this worker still holds it. The
 * caller writes the job's results in the same transaction and rolls back when this is false,
 * so a job's results are written once even if two workers ever ran it.
 */
export async function completeJob(trx: Knex.Transaction, id: number, workerId: string): Promise<boolean> {
  const n = await trx("jobs")
    .where({ id, leased_by: workerId, status: "running" })
    .update({ status: "done", finished_at: trx.raw("NOW(3)"), leased_until: null, last_error: null });
  return n === 1;
}

/** Retries with exponential backoff, or gives up after max_attempts. Returns true when given up. */
export async function failJob(job: Job, workerId: string, error: string): Promise<boolean> {
  const giveUp = job.attempts >= job.max_attempts;
  const delay = Math.min(env.jobs.retryMaxSeconds, env.jobs.retryBaseSeconds * 2 ** Math.min(job.attempts - 1, 30));
  await getDb()("jobs")
    .where({ id: job.id, leased_by: workerId })
    .update({
      status: giveUp ? "failed" : "queued",
      last_error: error.slice(0, 1000),
      leased_until: null,
      run_after: getDb().raw("NOW(3) + INTERVAL ? SECOND", [giveUp ? 0 : delay]),
      finished_at: giveUp ? getDb().raw("NOW(3)") : null,
    });
  return giveUp;
}

/**
 * Jobs of these kinds whose workers kept dying until no attempts were left: marked failed and
 * returned once, to the pool that handles them (only that pool knows how to give such a job up,
 * e.g. mark its document unreadable), so a pool never sweeps another pool's jobs.
 */
export async function sweepExhaustedJobs(kinds: string[]): Promise<Job[]> {
  if (kinds.length === 0) return [];
  return getDb().transaction(async (trx) => {
    const rows: Job[] = await trx("jobs")
      .whereIn("kind", kinds)
      .where("status", "running")
      .whereRaw("leased_until < NOW(3)")
      .whereRaw("attempts >= max_attempts")
      .forUpdate()
      .skipLocked()
      .select("id", "kind", "document_id", "payload", "attempts", "max_attempts");
    if (rows.length) {
      await trx("jobs")
        .whereIn("id", rows.map((r) => r.id))
        .update({ status: "failed", finished_at: trx.raw("NOW(3)"), last_error: "The worker stopped before finishing, too many times." });
    }
    return rows;
  });
}
