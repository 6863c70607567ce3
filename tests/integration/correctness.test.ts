import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { isDatabaseUnavailable } from "@/db/errors";
import { enqueueJob, sweepExhaustedJobs } from "@/lib/data/jobs";
import { fileDocument } from "@/lib/data/filing";
import { createTrainingVersion, LeaseLostError } from "@/lib/data/models";
import { runTraining } from "@/lib/learning/retrain";
import { startWorkers } from "@/lib/jobs/worker";
import { readJob } from "@/lib/jobs/read-job";
import { READ_JOB, TRAIN_JOB } from "@/lib/jobs/kinds";
import { AppError } from "@/lib/errors";
import { getObjectStream, isMissingObject, isStorageUnavailable } from "@/storage/s3";
import { S3Client, GetObjectCommand } from "@aws-sdk/client-s3";
import knex from "knex";
import { knexConfig } from "@/knexfile";
import { appDb, ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { insertFiledDocuments, insertReadDocument, typeIds } from "../helpers/filed-documents";
import type { CurrentUser } from "@/lib/data/users";
import { waitUntil as pollUntil } from "../helpers/wait";

// Defects found by reading the code (issue: the wall holds everywhere), each with a test that
// failed before its fix.
const owner = ownerDb();
let admin: CurrentUser;

const waitUntil = <T,>(what: string, probe: () => Promise<T | undefined | false | null>, ms = 30_000) => pollUntil(what, probe, ms, 100);

beforeAll(async () => {
  admin = await demoUser("admin@example.com");
  await owner("jobs").delete();
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("the exhausted-job sweep", () => {
  it("gives a dead read job up only in the pool that reads, never in the training pool", async () => {
    const doc = await insertReadDocument(owner, "A read that kept crashing its worker.", "crashing.pdf", { status: "reading", text: null });
    const jobId = await enqueueJob(READ_JOB, doc);
    // As a worker that died on its last attempt leaves it: running, lease run out, no attempts left.
    await owner("jobs").where({ id: jobId }).update({ status: "running", attempts: 5, max_attempts: 5, leased_by: "dead", leased_until: owner.raw("NOW(3) - INTERVAL 1 SECOND") });

    expect(await sweepExhaustedJobs([TRAIN_JOB])).toEqual([]);
    const training = startWorkers({ handlers: { [TRAIN_JOB]: { run: async () => {} } }, concurrency: 1, pollMs: 50, leaseSeconds: 30, log: () => {} });
    await new Promise((r) => setTimeout(r, 300)); // its first loop sweeps
    await training.stop();
    expect((await owner("jobs").where({ id: jobId }).first("status")).status).toBe("running");

    const reading = startWorkers({ handlers: { [READ_JOB]: readJob }, concurrency: 1, pollMs: 50, leaseSeconds: 30, log: () => {} });
    const row = await waitUntil("the reading pool to give the job up", async () => {
      const d = await owner("documents").where({ id: doc }).first("status", "unreadable_reason");
      return d.status === "unreadable" ? d : null;
    });
    await reading.stop();
    expect(row.unreadable_reason).toMatch(/could not read this file/i);
    expect((await owner("jobs").where({ id: jobId }).first("status")).status).toBe("failed");
  });
});

describe("moving a filed document", () => {
  it("serves two moves at once one after the other: the record chains, and a stale screen is refused", async () => {
    const types = await typeIds(owner);
    const matters = await owner("matters").whereIn("number", ["AQ-2026-0101", "AQ-2026-0102", "AQ-2026-0117"]).orderBy("number").pluck("id");
    const doc = await insertReadDocument(owner, "A lease renewal letter.", "lease-renewal.pdf");
    await fileDocument(admin, doc, { action: "file", cabinetTypeId: types.get("Contracts & leases"), matterId: matters[0] });

    // Both people saw it in the first matter; only one of them can move it from there.
    const results = await Promise.allSettled([
      fileDocument(admin, doc, { action: "move", matterId: matters[1], expectedMatterId: matters[0], reason: "wrong matter" }),
      fileDocument(admin, doc, { action: "move", matterId: matters[2], expectedMatterId: matters[0], reason: "wrong matter" }),
    ]);
    const ok = results.filter((r) => r.status === "fulfilled");
    const refused = results.filter((r): r is PromiseRejectedResult => r.status === "rejected");
    expect(ok).toHaveLength(1);
    expect(refused).toHaveLength(1);
    expect(refused[0].reason).toBeInstanceOf(AppError);
    expect(refused[0].reason).toMatchObject({ status: 409, code: "moved_meanwhile" });

    // Without a stale-screen guard both go through, in turn: the second starts where the first ended.
    await Promise.all([
      fileDocument(admin, doc, { action: "move", matterId: matters[0], reason: "wrong matter" }),
      fileDocument(admin, doc, { action: "move", cabinetTypeId: types.get("Correspondence"), reason: "wrong type" }),
    ]);
    const moves = await owner("filing_events").where({ document_id: doc, action: "moved" }).orderBy("id");
    expect(moves).toHaveLength(3);
    for (let i = 1; i < moves.length; i++) {
      expect(moves[i].from_matter_id).toBe(moves[i - 1].to_matter_id);
      expect(moves[i].from_cabinet_type_id).toBe(moves[i - 1].to_cabinet_type_id);
    }
    const now = await owner("documents").where({ id: doc }).first("matter_id", "cabinet_type_id");
    expect([now.matter_id, now.cabinet_type_id]).toEqual([moves[2].to_matter_id, moves[2].to_cabinet_type_id]);
  });
});

describe("a training job", () => {
  it("writes its results and completes its job in one transaction: a lost lease writes nothing", async () => {
    await owner("model_versions").update({ status: "retired" });
    await insertFiledDocuments(owner, 6);
    const versionId = await createTrainingVersion("manual", null);
    await expect(runTraining(versionId, {}, async () => false)).rejects.toBeInstanceOf(LeaseLostError);
    const row = await owner("model_versions").where({ id: versionId }).first();
    expect(row.status).toBe("training");
    expect(row.metrics).toBeNull();
    expect(row.artifact_key).toBeNull();

    // The same run with its lease held lands whole, and the completion ran inside it.
    const again = await createTrainingVersion("manual", null);
    let completedInside = false;
    await runTraining(again, {}, async (trx) => {
      completedInside = (await trx("model_versions").where({ id: again }).first("status")).status === "training";
      return true;
    });
    expect(completedInside).toBe(true);
    expect((await owner("model_versions").where({ id: again }).first("status")).status).toBe("current");
  });
});

describe("the database clock", () => {
  it("works in UTC on every connection, even when the server's own zone is not UTC", async () => {
    await owner.raw("SET GLOBAL time_zone = '+05:00'");
    const app = appDb(); // new connections, made after the server's zone changed
    try {
      const [{ now }] = (await app.raw("SELECT NOW(3) AS now"))[0];
      expect(Math.abs(new Date(now).getTime() - Date.now())).toBeLessThan(60_000);
      const id = await enqueueJob("clock-probe", null, null, app);
      const row = await app("jobs").where({ id }).first("created_at");
      expect(Math.abs(new Date(row.created_at).getTime() - Date.now())).toBeLessThan(60_000);
    } finally {
      await owner.raw("SET GLOBAL time_zone = 'SYSTEM'");
      await app.destroy();
    }
  });
});

describe("telling a service that is down from other failures", () => {
  it("a missing object is missing, not 'storage down'; a store that does not answer is down", async () => {
    const missing = await getObjectStream(`test/never-written-${Date.now()}`).catch((e) => e);
    expect(isMissingObject(missing)).toBe(true);
    expect(isStorageUnavailable(missing)).toBe(false);
    const dead = new S3Client({ endpoint: "http://127.0.0.1:9", region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "x", secretAccessKey: "y" }, maxAttempts: 1 });
    const down = await dead.send(new GetObjectCommand({ Bucket: "b", Key: "k" })).catch((e) => e);
    expect(isStorageUnavailable(down)).toBe(true);
    expect(isMissingObject(down)).toBe(false);
  });

  it("a database that does not answer is down; a failing statement is not", async () => {
    const bad = await getDb().raw("SELECT * FROM no_such_table").catch((e) => e);
    expect(isDatabaseUnavailable(bad)).toBe(false);
    const dead = knex({ ...knexConfig("app"), connection: { ...(knexConfig("app").connection as object), port: 9 }, acquireConnectionTimeout: 2000 });
    const down = await dead.raw("SELECT 1").catch((e) => e);
    await dead.destroy();
    expect(isDatabaseUnavailable(down)).toBe(true);
  });
});
