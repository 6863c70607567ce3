// The one Knex instance of the process (it owns the connection pool), as the application user.
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";

const globalForDb = globalThis as unknown as { foldwrightDb?: Knex };

export function getDb(): Knex {
  if (!globalForDb.foldwrightDb) globalForDb.foldwrightDb = knex(knexConfig("app"));
  return globalForDb.foldwrightDb;
}

export async function closeDb(): Promise<void> {
  const db = globalForDb.foldwrightDb;
  globalForDb.foldwrightDb = undefined;
  if (db) await db.destroy();
}
