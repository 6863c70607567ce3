import crypto from "node:crypto";
import { describe, expect, it } from "vitest";
import { deleteObject, getObjectBytes, getObjectStream, headObject, putObject } from "@/storage/s3";

// Put, head, get and delete against the real S3 fake (s3rver) through @aws-sdk/client-s3.
describe("object storage", () => {
  it("keeps the exact bytes, type and metadata of an original, then deletes it", async () => {
    const key = `test/${crypto.randomUUID()}`;
    const body = crypto.randomBytes(256 * 1024 + 17);
    const sha256 = crypto.createHash("sha256").update(body).digest("hex");
    await putObject(key, body, { contentType: "application/pdf", metadata: { sha256, "original-name": "lease.pdf" } });

    const info = await headObject(key);
    expect(info).toMatchObject({ size: body.length, contentType: "application/pdf" });
    expect(info?.metadata).toMatchObject({ sha256, "original-name": "lease.pdf" });

    const back = await getObjectBytes(key);
    expect(crypto.createHash("sha256").update(back).digest("hex")).toBe(sha256);

    const chunks: Buffer[] = [];
    for await (const chunk of await getObjectStream(key)) chunks.push(chunk as Buffer);
    expect(Buffer.concat(chunks).equals(body)).toBe(true);

    await deleteObject(key);
    expect(await headObject(key)).toBeNull();
  });

  it("answers null for a key that was never stored", async () => {
    expect(await headObject(`test/missing-${crypto.randomUUID()}`)).toBeNull();
  });
});
