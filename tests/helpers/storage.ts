import { DeleteObjectsCommand, ListObjectsV2Command } from "@aws-sdk/client-s3";
import { getS3 } from "@/storage/s3";

export async function listKeys(bucket: string): Promise<string[]> {
  const out = await getS3().send(new ListObjectsV2Command({ Bucket: bucket }));
  return (out.Contents ?? []).map((o) => o.Key!).filter(Boolean);
}

export async function emptyBucket(bucket: string): Promise<void> {
  const keys = await listKeys(bucket);
  if (keys.length === 0) return;
  await getS3().send(new DeleteObjectsCommand({ Bucket: bucket, Delete: { Objects: keys.map((Key) => ({ Key })) } }));
}
