import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { queueMail } from "@/lib/data/mail-log";
import { makeMailJob } from "@/lib/jobs/mail-job";
import { MAIL_JOB } from "@/lib/jobs/kinds";
import { startWorkers } from "@/lib/jobs/worker";
import { SMTPServer } from "smtp-server";
import { startMailCatcher } from "@/lib/mail/catcher";
import { listCaught } from "@/lib/mail/caught";
import { createMailTransport } from "@/lib/mail/transport";
import { getDb } from "@/db";
import { ownerDb } from "../helpers/db";

// A mail server that is down delays mail without losing it: the message waits in mail_log with
// the reason, the queue retries with backoff, and it goes out once the server answers again.
const owner = ownerDb();

afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

describe("the mail queue", () => {
  it("keeps a message while the server is down and sends it when it is back", async () => {
    const port = await freePort(); // nothing listens here yet
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "fw-mail-"));
    const to = `waiting-${Date.now()}@example.com`;
    await owner("jobs").where({ kind: MAIL_JOB }).whereIn("status", ["queued", "running"]).update({ status: "done" }); // only this test's message
    const mailId = await queueMail(getDb(), { kind: "reset", mail: { to, subject: "Held while the server is away", text: "A link: http://127.0.0.1/x" } });
    expect(mailId).toBeGreaterThan(0);
    const sealed = await owner("mail_log").where({ id: mailId }).first("sealed");
    expect(sealed.sealed).not.toContain("http://127.0.0.1/x"); // the waiting content is sealed

    const handler = makeMailJob(() => createMailTransport({ host: "127.0.0.1", port, secure: false, user: "", password: "" }));
    const workers = startWorkers({ handlers: { [MAIL_JOB]: handler }, concurrency: 1, pollMs: 100, leaseSeconds: 30, log: () => {} });
    let catcher: Awaited<ReturnType<typeof startMailCatcher>> | null = null;
    try {
      await expect.poll(async () => (await owner("mail_log").where({ id: mailId }).first("attempts")).attempts, { timeout: 20_000 }).toBeGreaterThan(0);
      const waiting = await owner("mail_log").where({ id: mailId }).first("state", "last_error", "sent_at");
      expect(waiting.state).toBe("queued");
      expect(waiting.last_error).toMatch(/ECONNREFUSED/);
      expect(waiting.sent_at).toBeNull();
      const job = await owner("jobs").where({ kind: MAIL_JOB }).whereRaw("JSON_EXTRACT(payload, '$.mailId') = ?", [mailId]).first("status", "run_after");
      expect(job.status).toBe("queued"); // to be tried again after its backoff

      catcher = await startMailCatcher(port, dir);
      await expect.poll(async () => (await owner("mail_log").where({ id: mailId }).first("state")).state, { timeout: 30_000, interval: 250 }).toBe("sent");
      const sent = await owner("mail_log").where({ id: mailId }).first("message_id", "sealed", "last_error");
      expect(sent.sealed).toBeNull();
      expect(sent.last_error).toBeNull();
      const caught = await listCaught(dir);
      expect(caught).toHaveLength(1);
      expect(caught[0].to).toEqual([to]);
      expect(caught[0].messageId).toBe(sent.message_id);
      expect(caught[0].text).toContain("A link: http://127.0.0.1/x");
    } finally {
      await workers.stop();
      await catcher?.stop();
    }
  });

  it("marks a message the server refuses for good (a 5yz reply) failed at once, with the reason", async () => {
    // RFC 5321 §4.2.1: 5yz is a permanent negative reply; retrying the same message cannot succeed.
    const port = await freePort();
    const refusing = new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS"],
      logger: false,
      onRcptTo: (_a, _s, cb) => cb(Object.assign(new Error("No such mailbox here"), { responseCode: 550 })),
    });
    await new Promise<void>((r) => refusing.listen(port, "127.0.0.1", () => r()));
    await owner("jobs").where({ kind: MAIL_JOB }).whereIn("status", ["queued", "running"]).update({ status: "done" });
    const mailId = await queueMail(getDb(), { kind: "digest", mail: { to: `gone-${Date.now()}@example.com`, subject: "Refused", text: "x" } });
    const handler = makeMailJob(() => createMailTransport({ host: "127.0.0.1", port, secure: false, user: "", password: "" }));
    const workers = startWorkers({ handlers: { [MAIL_JOB]: handler }, concurrency: 1, pollMs: 100, leaseSeconds: 30, log: () => {} });
    try {
      await expect.poll(async () => (await owner("mail_log").where({ id: mailId }).first("state")).state, { timeout: 20_000 }).toBe("failed");
      const row = await owner("mail_log").where({ id: mailId }).first("attempts", "last_error");
      expect(row.attempts).toBe(1);
      expect(row.last_error).toMatch(/^The mail server refused this message: .*550/);
      const job = await owner("jobs").where({ kind: MAIL_JOB }).whereRaw("JSON_EXTRACT(payload, '$.mailId') = ?", [mailId]).first("status");
      expect(job.status).toBe("done"); // not tried again
    } finally {
      await workers.stop();
      await new Promise<void>((r) => refusing.close(() => r()));
    }
  });
});
