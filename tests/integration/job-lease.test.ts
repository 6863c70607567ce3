import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { claimJobs, enqueueJob, extendLease } from "@/lib/data/jobs";
import { ownerDb } from "../helpers/db";

// Issue 13: a short lease renewed by a heartbeat, so a dead worker's job is taken over within
// one lease — and a live worker's job is never taken while it keeps beating.
const owner = ownerDb();
const KIND = "lease_test";
const LEASE_SECONDS = 2;

beforeAll(async () => {
  await owner("jobs").where({ kind: KIND }).delete();
});
afterAll(async () => {
  await owner("jobs").where({ kind: KIND }).delete();
  await owner.destroy();
  await closeDb();
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe("job leases", () => {
  it("a job whose worker stops heartbeating is retaken after the lease; one that beats is not", async () => {
    const silent = await enqueueJob(KIND, null, {});
    const beating = await enqueueJob(KIND, null, {});
    const taken = await claimJobs("worker-a", [KIND], 2, LEASE_SECONDS);
    expect(taken.map((j) => j.id).sort()).toEqual([silent, beating].sort());
    expect(await claimJobs("worker-b", [KIND], 2, LEASE_SECONDS)).toEqual([]); // both held

    // worker-a keeps beating for `beating` only, as its heartbeat would; `silent`'s worker died.
    const deadline = Date.now() + (LEASE_SECONDS + 1) * 1000;
    while (Date.now() < deadline) {
      expect(await extendLease(beating, "worker-a", LEASE_SECONDS)).toBe(true);
      await sleep((LEASE_SECONDS * 1000) / 3);
    }
    const retaken = await claimJobs("worker-b", [KIND], 2, LEASE_SECONDS);
    expect(retaken.map((j) => j.id)).toEqual([silent]);
    expect(retaken[0].attempts).toBe(2);
    // The dead worker's late heartbeat no longer holds the job.
    expect(await extendLease(silent, "worker-a", LEASE_SECONDS)).toBe(false);
  });
});
