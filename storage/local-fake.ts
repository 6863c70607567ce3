// The local S3 fake: s3rver on 127.0.0.1 with its files under .data/s3. Reused when something
// already answers on the configured port.
import path from "node:path";
import fs from "node:fs";
import S3rver from "s3rver";
import { env } from "@/lib/env";
import { isPortOpen } from "@/lib/stack/process";
import { ensureBucket } from "@/storage/s3";

export interface LocalStorage {
  startedHere: boolean;
  stop(): Promise<void>;
}

export async function startLocalStorage(buckets: string[] = [env.s3.bucket]): Promise<LocalStorage> {
  const url = new URL(env.s3.endpoint);
  const port = Number(url.port || 80);
  let result: LocalStorage = { startedHere: false, stop: async () => {} };
  if (!(await isPortOpen(port, url.hostname))) {
    if (!env.s3.startLocal || !["127.0.0.1", "localhost"].includes(url.hostname)) {
      throw new Error(`Nothing answers at ${env.s3.endpoint} and S3_START_LOCAL is off or the endpoint is not local. Check S3_ENDPOINT.`);
    }
    const directory = path.join(env.dataDir, "s3");
    fs.mkdirSync(directory, { recursive: true });
    const server = new S3rver({ address: "127.0.0.1", port, directory, silent: true });
    await server.run();
    result = { startedHere: true, stop: () => server.close() };
  }
  for (const bucket of buckets) await ensureBucket(bucket);
  return result;
}
