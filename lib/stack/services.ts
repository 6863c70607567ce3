// Starts (or reuses) the services Foldwright needs on loopback: MariaDB, the S3 fake and the
// local mail catcher (MAIL_START_CATCHER=false when MAIL_* points at a real mail server).
import { startLocalDatabase, type LocalDatabase } from "@/db/local-server";
import { env } from "@/lib/env";
import { startMailCatcher, type MailCatcher } from "@/lib/mail/catcher";
import { startLocalStorage, type LocalStorage } from "@/storage/local-fake";

export interface Services {
  database: LocalDatabase;
  storage: LocalStorage;
  mail: MailCatcher | null;
  stop(): Promise<void>;
}

export async function startServices(buckets?: string[]): Promise<Services> {
  const database = await startLocalDatabase();
  const storage = await startLocalStorage(buckets);
  const mail = env.mail.startCatcher ? await startMailCatcher(env.mail.catcherPort, env.mail.catcherDir) : null;
  return {
    database,
    storage,
    mail,
    async stop() {
      await mail?.stop();
      await storage.stop();
      await database.stop();
    },
  };
}
