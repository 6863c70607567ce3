// Starts (or reuses) the services Foldwright needs on loopback: MariaDB and the S3 fake.
import { startLocalDatabase, type LocalDatabase } from "@/db/local-server";
import { startLocalStorage, type LocalStorage } from "@/storage/local-fake";

export interface Services {
  database: LocalDatabase;
  storage: LocalStorage;
  stop(): Promise<void>;
}

export async function startServices(buckets?: string[]): Promise<Services> {
  const database = await startLocalDatabase();
  const storage = await startLocalStorage(buckets);
  return {
    database,
    storage,
    async stop() {
      await storage.stop();
      await database.stop();
    },
  };
}
