// Migrations and seeds, run as the database owner.
//   tsx db/migrate.ts latest|rollback|seed|make NAME   (DATABASE_NAME picks the database)
import fs from "node:fs";
import path from "node:path";
import knex, { type Knex } from "knex";
import { knexConfig, MIGRATIONS_DIR, SEEDS_DIR } from "@/knexfile";
import { runSeeds } from "@/db/module-source";
import { env } from "@/lib/env";
import { createDatabase } from "@/db/local-server";

export function ownerKnex(database = env.db.name): Knex {
  return knex(knexConfig("owner", database));
}

export async function migrateDatabase(database = env.db.name): Promise<void> {
  await createDatabase(database);
  const k = ownerKnex(database);
  try {
    await k.migrate.latest();
  } finally {
    await k.destroy();
  }
}

export async function seedDatabase(database = env.db.name): Promise<void> {
  const k = ownerKnex(database);
  try {
    await runSeeds(k, SEEDS_DIR);
  } finally {
    await k.destroy();
  }
}

/** Writes an empty, timestamped migration with up and down; prints its path. */
function makeMigration(name: string): string {
  const stamp = new Date().toISOString().replace(/\D/g, "").slice(0, 14);
  const file = path.join(MIGRATIONS_DIR, `${stamp}_${name.replace(/\W+/g, "_")}.ts`);
  fs.writeFileSync(
    file,
    `import type { Knex } from "knex";\nimport { grantApp, READ_WRITE, revokeApp } from "../grants";\n\nexport async function up(knex: Knex): Promise<void> {\n}\n\nexport async function down(knex: Knex): Promise<void> {\n}\n`,
  );
  return file;
}

async function main(): Promise<void> {
  const [command, name] = process.argv.slice(2);
  const k = ownerKnex();
  try {
    if (command === "latest") {
      await k.destroy();
      await migrateDatabase();
    } else if (command === "rollback") await k.migrate.rollback();
    else if (command === "seed") await runSeeds(k, SEEDS_DIR);
    else if (command === "make" && name) console.log(makeMigration(name));
    else {
      console.error("usage: tsx db/migrate.ts latest|rollback|seed|make NAME");
      process.exitCode = 2;
    }
  } finally {
    await k.destroy();
  }
}

if (process.argv[1]?.endsWith("migrate.ts")) void main();
