import { spawn, type ChildProcess } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { claimJobs, completeJob, enqueueJob } from "@/lib/data/jobs";
import { storeUpload } from "@/lib/data/intake";
import { startWorkers } from "@/lib/jobs/worker";
import { readJob } from "@/lib/jobs/read-job";
import { closeDb, getDb } from "@/db";
import type { CurrentUser } from "@/lib/data/users";
import { makeDocx, makeImagePdf, renderTextPng } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";
import { demoUser } from "../helpers/users";
import { waitUntil as pollUntil } from "../helpers/wait";

// The MariaDB job queue: SKIP LOCKED claims, leases, retries, and a worker killed mid-job.
const owner = ownerDb();
let clerk: CurrentUser;

const waitUntil = <T,>(what: string, probe: () => Promise<T | undefined | false | null>, ms = 60_000) => pollUntil(what, probe, ms, 200);

beforeAll(async () => {
  clerk = await demoUser("clerk@example.com");
  await owner("jobs").delete(); // earlier test files leave queued reads; this file runs its own
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("job queue", () => {
  it("gives each job to one claimer when two claim at once (SKIP LOCKED)", async () => {
    const ids = await Promise.all(Array.from({ length: 6 }, () => enqueueJob("probe", null)));
    const [a, b] = await Promise.all([claimJobs("worker-a", ["probe"], 4, 60), claimJobs("worker-b", ["probe"], 4, 60)]);
    // SKIP LOCKED may hand one claimer fewer rows than asked, never a row the other holds.
    const rest = await claimJobs("worker-c", ["probe"], 6, 60);
    const taken = [...a, ...b, ...rest].map((j) => j.id).sort((x, y) => x - y);
    expect(new Set(taken).size).toBe(taken.length);
    expect(taken).toEqual([...ids].sort((x, y) => x - y));
    expect(a.length + b.length).toBeGreaterThan(0);
    await owner("jobs").where({ kind: "probe" }).delete();
  });

  it("takes a job again when its lease ran out, and the stale worker can no longer complete it", async () => {
    const id = await enqueueJob("probe", null);
    const [first] = await claimJobs("worker-old", ["probe"], 1, 60);
    expect(first.id).toBe(id);
    expect(await claimJobs("worker-new", ["probe"], 1, 60)).toEqual([]); // leased
    await owner("jobs").where({ id }).update({ leased_until: owner.raw("NOW(3) - INTERVAL 1 SECOND") });
    const [again] = await claimJobs("worker-new", ["probe"], 1, 60);
    expect(again).toMatchObject({ id, attempts: 2 });
    expect(await getDb().transaction((trx) => completeJob(trx, id, "worker-old"))).toBe(false);
    expect(await getDb().transaction((trx) => completeJob(trx, id, "worker-new"))).toBe(true);
    expect((await owner("jobs").where({ id }).first()).status).toBe("done");
  });

  it("reads an uploaded Word file in the background: text, counts of sensitive numbers", async () => {
    const docx = await makeDocx(["Payroll register for March", "Employee SSN 401-23-4567 was corrected.", `Run ${Date.now()}`]);
    const up = await storeUpload(clerk, "payroll.docx", docx);
    if (up.status !== "reading") throw new Error(JSON.stringify(up));
    const workers = startWorkers({ handlers: { read: readJob }, concurrency: 1, pollMs: 100, leaseSeconds: 30, log: () => {} });
    try {
      const doc = await waitUntil("reading", async () => {
        const d = await owner("documents").where({ id: up.id }).first();
        return d.status !== "reading" && d;
      });
      expect(doc).toMatchObject({ status: "ready", ocr_used: 0, ssn_count: 1, routing_count: 0, card_count: 0 });
      expect(doc.text).toContain("Payroll register for March");
      expect((await owner("jobs").where({ document_id: up.id }).first()).status).toBe("done");
    } finally {
      await workers.stop();
    }
  });

  it("finishes a job once after its worker is killed mid-job", { timeout: 180_000 }, async () => {
    const png = await renderTextPng(["Notice of tax adjustment", "Please keep this letter with your records", `Batch ${Date.now()}`]);
    const scanned = await makeImagePdf([png, png]);
    const up = await storeUpload(clerk, "scan.pdf", scanned);
    if (up.status !== "reading") throw new Error(JSON.stringify(up));
    const worker = (): ChildProcess =>
      // node itself with tsx's loader, so that SIGKILL hits the process doing the work
      // (the tsx command would run it in a child that outlives its killed parent).
      spawn(process.execPath, ["--import", "tsx", "--conditions=react-server", "lib/jobs/cli.ts"], {
        env: { ...process.env, JOBS_LEASE_SECONDS: "3", JOBS_POLL_MS: "200", JOBS_CONCURRENCY: "1" },
        stdio: "ignore",
      });

    const first = worker();
    const leased = await waitUntil("the first worker to take the job", async () => {
      const j = await owner("jobs").where({ document_id: up.id }).first();
      return j.status === "running" && j;
    });
    first.kill("SIGKILL"); // mid-job: the OCR of a scanned page takes seconds
    await new Promise((r) => first.once("exit", r));
    expect((await owner("documents").where({ id: up.id }).first()).status).toBe("reading");

    const second = worker();
    try {
      const doc = await waitUntil("the second worker to finish", async () => {
        const d = await owner("documents").where({ id: up.id }).first();
        return d.status !== "reading" && d;
      }, 90_000);
      expect(doc).toMatchObject({ status: "ready", ocr_used: 1, page_count: 2 });
      expect(doc.text).toMatch(/tax adjustment/i);
      const job = await owner("jobs").where({ document_id: up.id }).first();
      expect(job).toMatchObject({ status: "done", attempts: 2 });
      expect(job.leased_by).not.toBe(leased.leased_by);
      expect(await owner("jobs").where({ document_id: up.id, kind: "read" }).count({ n: "*" })).toEqual([{ n: 1 }]);
    } finally {
      second.kill("SIGTERM");
      await new Promise((r) => second.once("exit", r));
    }
  });
});
