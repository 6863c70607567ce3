// The S3 client wrapper: endpoint, region, path-style and credentials come from config, so the
// local fake (s3rver) and any real S3-compatible service work with no code change.
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import type { Readable } from "node:stream";
import { env } from "@/lib/env";
import { markUnavailable } from "@/lib/unavailable";

const globalForS3 = globalThis as unknown as { foldwrightS3?: S3Client };

export function getS3(): S3Client {
  if (!globalForS3.foldwrightS3) {
    globalForS3.foldwrightS3 = new S3Client({
      endpoint: env.s3.endpoint,
      region: env.s3.region,
      forcePathStyle: env.s3.forcePathStyle,
      credentials: { accessKeyId: env.s3.accessKeyId, secretAccessKey: env.s3.secretAccessKey },
      // Without these two the SDK frames streamed uploads with checksums that some
      // S3-compatible stores (s3rver among them) keep inside the object.
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
      maxAttempts: 2,
      // Without limits a store that accepts the connection and never answers holds a request forever.
      requestHandler: { connectionTimeout: env.s3.connectTimeoutMs, requestTimeout: env.s3.requestTimeoutMs },
    });
    // Marks "the store is not answering" on the error itself, so every caller's error answers 503
    // with a sentence (lib/http.ts, the page error boundaries) without checking it again.
    globalForS3.foldwrightS3.middlewareStack.add(
      (next) => async (args) => {
        try {
          return await next(args);
        } catch (e) {
          throw isStorageUnavailable(e) ? markUnavailable(e, "storage") : e;
        }
      },
      { step: "initialize", name: "foldwrightMarkUnavailable" },
    );
  }
  return globalForS3.foldwrightS3;
}

export interface StoredObjectInfo {
  size: number;
  contentType?: string;
  metadata: Record<string, string>;
}

export async function putObject(
  key: string,
  body: Buffer | Readable,
  options: { contentType: string; metadata?: Record<string, string>; contentLength?: number },
  bucket = env.s3.bucket,
): Promise<void> {
  await getS3().send(
    new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: options.contentType, Metadata: options.metadata, ContentLength: options.contentLength }),
  );
}

/** The object is not in the bucket (a lost or disposed original), as opposed to a store that is down. */
export function isMissingObject(e: unknown): boolean {
  return e instanceof Error && (e.name === "NotFound" || e.name === "NoSuchKey");
}

/**
 * The store is not answering: a network failure, a time-out or a 5xx. Anything else (a missing
 * object, access denied, a bad request) is not "try again later" and must not be answered as 503.
 */
export function isStorageUnavailable(e: unknown): boolean {
  if (typeof e !== "object" || e === null) return false;
  const err = e as { name?: string; code?: string; $metadata?: { httpStatusCode?: number } };
  const status = err.$metadata?.httpStatusCode;
  if (status !== undefined) return status >= 500;
  return true; // no HTTP answer at all: connection refused, reset, DNS, time-out
}

export async function headObject(key: string, bucket = env.s3.bucket): Promise<StoredObjectInfo | null> {
  try {
    const out = await getS3().send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return { size: out.ContentLength ?? 0, contentType: out.ContentType, metadata: out.Metadata ?? {} };
  } catch (e) {
    if (isMissingObject(e)) return null;
    throw e;
  }
}

export async function getObjectStream(key: string, bucket = env.s3.bucket): Promise<Readable> {
  const out = await getS3().send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  return out.Body as Readable;
}

export async function getObjectBytes(key: string, bucket = env.s3.bucket): Promise<Buffer> {
  const out = await getS3().send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  return Buffer.from(await out.Body!.transformToByteArray());
}

/** Deletes every object whose key starts with `prefix` (one by one: s3rver has no batch delete). */
export async function deleteObjectsUnder(prefix: string, bucket = env.s3.bucket): Promise<number> {
  let deleted = 0;
  let token: string | undefined;
  do {
    const page = await getS3().send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) {
      if (!o.Key) continue;
      await deleteObject(o.Key, bucket);
      deleted++;
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return deleted;
}

export async function deleteObject(key: string, bucket = env.s3.bucket): Promise<void> {
  await getS3().send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}

export async function ensureBucket(bucket = env.s3.bucket): Promise<void> {
  try {
    await getS3().send(new HeadBucketCommand({ Bucket: bucket }));
  } catch {
    await getS3().send(new CreateBucketCommand({ Bucket: bucket }));
  }
}

/** True when the bucket answers; used by the health route. */
export async function checkStorage(bucket = env.s3.bucket): Promise<boolean> {
  try {
    await getS3().send(new HeadBucketCommand({ Bucket: bucket }));
    return true;
  } catch {
    return false;
  }
}
