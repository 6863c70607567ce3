// Per-table grants for the application user, made by the migrations that create each table.
// Table-level grants (not `db.*`) so that a table such as filing_events can be append-only.
import type { Knex } from "knex";
import { env } from "@/lib/env";

export const READ_WRITE = "SELECT, INSERT, UPDATE, DELETE";
export const APPEND_ONLY = "SELECT, INSERT";

function databaseOf(knex: Knex): string {
  const conn = knex.client.config.connection as { database?: string };
  if (!conn.database) throw new Error("The migration connection names no database.");
  return conn.database;
}

export async function grantApp(knex: Knex, tables: string[], privileges: string): Promise<void> {
  const database = databaseOf(knex);
  for (const table of tables) {
    for (const host of ["127.0.0.1", "localhost"]) {
      await knex.raw(`GRANT ${privileges} ON ??.?? TO ?@?`, [database, table, env.db.user, host]);
    }
  }
}

export async function revokeApp(knex: Knex, tables: string[]): Promise<void> {
  const database = databaseOf(knex);
  for (const table of tables) {
    for (const host of ["127.0.0.1", "localhost"]) {
      await knex.raw(`REVOKE ALL PRIVILEGES ON ??.?? FROM ?@?`, [database, table, env.db.user, host]).catch(() => {});
    }
  }
}
