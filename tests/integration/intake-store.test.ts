import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import knex from "knex";
import S3rver from "s3rver";
import { S3Client } from "@aws-sdk/client-s3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DATABASE_DOWN, STORAGE_DOWN, storeUpload } from "@/lib/data/intake";
import { closeDb, getDb } from "@/db";
import { env } from "@/lib/env";
import { getS3, headObject } from "@/storage/s3";
import type { CurrentUser } from "@/lib/data/users";
import { makeTextPdf } from "../helpers/make-files";
import { ownerDb } from "../helpers/db";
import { listKeys } from "../helpers/storage";
import { demoUser } from "../helpers/users";

// Upload storage order and faults: the original goes to the bucket first, then the row commits;
// a failure at either step leaves nothing behind.
const owner = ownerDb();
let clerk: CurrentUser;
const g = globalThis as unknown as { foldwrightS3?: S3Client; foldwrightDb?: ReturnType<typeof knex> };

async function uniquePdf(label: string): Promise<Uint8Array> {
  return makeTextPdf([[`Invoice ${label}`, `Reference ${crypto.randomUUID()}`]]);
}
const countDocs = async () => Number((await owner("documents").count({ n: "*" }))[0].n);

beforeAll(async () => {
  clerk = await demoUser("clerk@example.com");
});
afterAll(async () => {
  await owner.destroy();
  await closeDb();
});

describe("storing an upload", () => {
  it("keeps the original with its hash and name, then commits the row and a read job", async () => {
    const bytes = await uniquePdf("A-1");
    const r = await storeUpload(clerk, "../../etc/Invoice A-1.pdf", bytes);
    expect(r.status).toBe("reading");
    if (r.status !== "reading") return;
    const row = await owner("documents").where({ id: r.id }).first();
    expect(row).toMatchObject({ original_name: "Invoice A-1.pdf", media_type: "application/pdf", size_bytes: bytes.length, status: "reading" });
    expect(row.sha256).toBe(crypto.createHash("sha256").update(bytes).digest("hex"));
    const object = await headObject(row.storage_key);
    expect(object?.size).toBe(bytes.length);
    expect(object?.metadata.sha256).toBe(row.sha256);
    expect(decodeURIComponent(object!.metadata["original-name"])).toBe("Invoice A-1.pdf");
    expect(await owner("jobs").where({ document_id: r.id, kind: "read", status: "queued" }).count({ n: "*" })).toEqual([{ n: 1 }]);
  });

  it("does not store an exact duplicate twice, and says who brought the first copy and when", async () => {
    const bytes = await uniquePdf("A-2");
    const first = await storeUpload(clerk, "statement.pdf", bytes);
    const keysBefore = (await listKeys(env.s3.bucket)).length;
    const docsBefore = await countDocs();
    const again = await storeUpload(clerk, "statement (copy).pdf", bytes);
    expect(again.status).toBe("duplicate");
    if (again.status !== "duplicate" || first.status !== "reading") return;
    expect(again.duplicateOf.id).toBe(first.id);
    expect(again.duplicateOf.message).toMatch(new RegExp(`already held as document #${first.id} \\("statement.pdf"\\), which came in on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC from Tamsin Reyes\\. It is not filed yet\\. It was not stored again\\.`));
    expect((await listKeys(env.s3.bucket)).length).toBe(keysBefore);
    expect(await countDocs()).toBe(docsBefore);
  });

  it("hides the details of a duplicate that sits in a restricted matter the user is not on", async () => {
    const bytes = await uniquePdf("A-3");
    const admin = await demoUser("admin@example.com");
    const first = await storeUpload(admin, "walled.pdf", bytes);
    if (first.status !== "reading") throw new Error("setup failed");
    const walled = await owner("matters").where({ restricted: true }).first("id");
    await owner("documents").where({ id: first.id }).update({ matter_id: walled.id });
    const again = await storeUpload(clerk, "walled.pdf", bytes);
    expect(again).toMatchObject({ status: "duplicate", duplicateOf: { id: null } });
    if (again.status === "duplicate") expect(again.duplicateOf.message).toMatch(/already held and was not stored again. Restricted — ask the matter's team./);
  });

  it("answers 503 and keeps nothing when storage stops before the upload", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "fw-s3-"));
    const server = new S3rver({ address: "127.0.0.1", port: 0, directory: dir, silent: true });
    const { port } = await server.run();
    const real = g.foldwrightS3;
    g.foldwrightS3 = new S3Client({ endpoint: `http://127.0.0.1:${port}`, region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" }, maxAttempts: 1 });
    await server.close(); // storage goes away between the check and the upload
    const before = await countDocs();
    try {
      const r = await storeUpload(clerk, "during-outage.pdf", await uniquePdf("B-1"));
      expect(r).toMatchObject({ status: "rejected", httpStatus: 503, error: { code: "storage_unavailable", message: STORAGE_DOWN } });
      expect(await countDocs()).toBe(before);
    } finally {
      g.foldwrightS3 = real;
    }
  });

  it("removes the stored original when the database stops after the object was written", async () => {
    const realDb = getDb();
    const s3 = getS3();
    const realSend = s3.send.bind(s3);
    const deadDb = knex({ client: "mysql2", connection: { host: "127.0.0.1", port: 1, user: "x", database: "x", connectTimeout: 1000 }, pool: { min: 0, max: 1 } });
    let writtenKey = "";
    // After the real PutObject succeeds, the database "stops": later queries go to a closed port.
    (s3 as unknown as { send: typeof realSend }).send = (async (command: { constructor: { name: string }; input: { Key?: string } }) => {
      const out = await realSend(command as never);
      if (command.constructor.name === "PutObjectCommand") {
        writtenKey = command.input.Key!;
        g.foldwrightDb = deadDb;
      }
      return out;
    }) as typeof realSend;
    const before = await countDocs();
    try {
      const r = await storeUpload(clerk, "db-outage.pdf", await uniquePdf("B-2"));
      expect(r).toMatchObject({ status: "rejected", httpStatus: 503, error: { code: "database_unavailable", message: DATABASE_DOWN } });
    } finally {
      (s3 as unknown as { send: typeof realSend }).send = realSend;
      g.foldwrightDb = realDb;
      await deadDb.destroy();
    }
    expect(writtenKey).toMatch(/^originals\//);
    expect(await headObject(writtenKey)).toBeNull();
    expect(await countDocs()).toBe(before);
  });
});
