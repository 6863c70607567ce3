// A private MariaDB for one checkout: data under .data/mariadb, its own port and socket, bound to
// 127.0.0.1. A server left running by an earlier start is reused (we then do not stop it).
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import mysql from "mysql2/promise";
import { env } from "@/lib/env";
import { findBinary, isPortOpen, run, stopChild, waitFor } from "@/lib/stack/process";

export interface LocalDatabase {
  startedHere: boolean;
  stop(): Promise<void>;
}

function paths() {
  const dir = path.join(env.dataDir, "mariadb");
  return {
    dir,
    data: path.join(dir, "data"),
    socket: path.join(dir, "mariadb.sock"),
    pid: path.join(dir, "mariadb.pid"),
    log: path.join(dir, "mariadb.log"),
  };
}

function requireBinary(name: string): string {
  const bin = findBinary(name);
  if (!bin) {
    throw new Error(
      `MariaDB is not installed (${name} not found). Install it with:\n  apt-get update && apt-get install -y mariadb-server\nthen start again.`,
    );
  }
  return bin;
}

export async function startLocalDatabase(): Promise<LocalDatabase> {
  const { port, host } = env.db;
  if (await isPortOpen(port, host)) return { startedHere: false, stop: async () => {} };
  if (!env.db.startLocal) {
    throw new Error(`Nothing answers at ${host}:${port} and DATABASE_START_LOCAL is off. Start your database or fix DATABASE_HOST/DATABASE_PORT.`);
  }
  const p = paths();
  fs.mkdirSync(p.dir, { recursive: true });
  // Its own temporary directory: a sweep of the machine's /tmp must not remove the files of a
  // query's temporary table while the query runs (seen at 100,000 documents).
  const tmp = path.join(p.dir, "tmp");
  fs.mkdirSync(tmp, { recursive: true });
  if (!fs.existsSync(path.join(p.data, "mysql"))) {
    await run(requireBinary("mariadb-install-db"), [
      "--no-defaults",
      `--datadir=${p.data}`,
      "--user=root",
      "--auth-root-authentication-method=normal",
      "--skip-test-db",
    ]);
  }
  const child: ChildProcess = spawn(
    requireBinary("mariadbd"),
    [
      "--no-defaults",
      `--datadir=${p.data}`,
      `--socket=${p.socket}`,
      `--pid-file=${p.pid}`,
      `--tmpdir=${tmp}`,
      `--port=${port}`,
      "--bind-address=127.0.0.1",
      "--user=root",
      "--skip-name-resolve",
      `--log-error=${p.log}`,
      "--character-set-server=utf8mb4",
      "--collation-server=utf8mb4_unicode_ci",
      "--innodb-buffer-pool-size=256M",
    ],
    { stdio: "ignore", detached: false },
  );
  let exited = false;
  child.once("exit", () => (exited = true));
  await waitFor("MariaDB", async () => {
    if (exited) throw new Error(`mariadbd stopped at start; see ${p.log}`);
    return pingDatabase();
  });
  return { startedHere: true, stop: () => stopChild(child, 30_000) };
}

export async function pingDatabase(): Promise<boolean> {
  try {
    const conn = await adminConnection();
    await conn.query("SELECT 1");
    await conn.end();
    return true;
  } catch {
    return false;
  }
}

export function adminConnection(database?: string) {
  return mysql.createConnection({
    host: env.db.host,
    port: env.db.port,
    user: env.db.adminUser,
    password: env.db.adminPassword,
    database,
    multipleStatements: false,
  });
}

const NAME = /^[A-Za-z0-9_]+$/;

/** Creates the database and the application user (no grants: migrations grant per table). */
export async function createDatabase(name: string): Promise<void> {
  if (!NAME.test(name) || !NAME.test(env.db.user)) throw new Error(`Unsafe database or user name: ${name}`);
  const conn = await adminConnection();
  try {
    await conn.query(`CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    for (const host of ["127.0.0.1", "localhost"]) {
      await conn.query(`CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?`, [env.db.user, host, env.db.password]);
    }
  } finally {
    await conn.end();
  }
}

export async function dropDatabase(name: string): Promise<void> {
  if (!NAME.test(name)) throw new Error(`Unsafe database name: ${name}`);
  const conn = await adminConnection();
  try {
    await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
  } finally {
    await conn.end();
  }
}
