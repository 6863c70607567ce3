// Knex configuration keyed by environment. The app connects as the application user, which
// holds only the per-table grants the migrations give it; migrations and seeds run as the
// database owner (DATABASE_ADMIN_USER).
import type { Knex } from "knex";
import path from "node:path";
import { env } from "./lib/env";
import { migrationSource } from "./db/module-source";
import { timedMySql2Client } from "./db/timed-client";

export const MIGRATIONS_DIR = path.join(env.root, "db/migrations");
export const SEEDS_DIR = path.join(env.root, "db/seeds");

type Role = "app" | "owner";

export function knexConfig(role: Role = "app", database = env.db.name): Knex.Config {
  // The app's statements are bounded (see db/timed-client.ts); migrations and seeds are not.
  const queryTimeoutMs = role === "app" ? env.db.queryTimeoutMs : 0;
  const sessionSql =
    queryTimeoutMs > 0
      ? `SET time_zone = '+00:00', max_statement_time = ${Math.max(1, Math.ceil(queryTimeoutMs / 1000))}`
      : "SET time_zone = '+00:00'";
  return {
    client: timedMySql2Client(queryTimeoutMs) as unknown as typeof Knex.Client,
    connection: {
      host: env.db.host,
      port: env.db.port,
      user: role === "app" ? env.db.user : env.db.adminUser,
      password: role === "app" ? env.db.password : env.db.adminPassword,
      database,
      charset: "utf8mb4",
      dateStrings: false,
      timezone: "Z",
      supportBigNumbers: true,
      connectTimeout: env.db.connectTimeoutMs,
    },
    acquireConnectionTimeout: env.db.acquireTimeoutMs,
    pool: {
      min: 0,
      max: role === "app" ? env.db.poolMax : 2,
      // Every connection works in UTC, whatever the server's own zone: NOW() defaults and the
      // dates mysql2 sends and reads (timezone "Z" above) then agree.
      afterCreate: (conn: { query: (sql: string, cb: (err: Error | null) => void) => void }, done: (err: Error | null, conn: unknown) => void) => {
        conn.query(sessionSql, (err) => done(err, conn));
      },
    },
    migrations: {
      migrationSource: migrationSource(MIGRATIONS_DIR),
      tableName: "knex_migrations",
    },
  };
}

const config: Record<string, Knex.Config> = {
  development: knexConfig("owner"),
  test: knexConfig("owner", process.env.DATABASE_NAME ?? "foldwright_test"),
  production: knexConfig("owner"),
};

export default config;
