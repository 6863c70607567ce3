import "server-only";
import { getDb } from "@/db";
import { checkStorage } from "@/storage/s3";

export async function checkHealth(): Promise<{ database: "ok" | "down"; storage: "ok" | "down" }> {
  const [database, storage] = await Promise.all([
    getDb()
      .raw("SELECT 1")
      .then(() => "ok" as const, () => "down" as const),
    checkStorage().then((ok) => (ok ? ("ok" as const) : ("down" as const))),
  ]);
  return { database, storage };
}
