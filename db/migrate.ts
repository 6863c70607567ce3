// Migrations and seeds, run as the database owner.
//   tsx db/migrate.ts latest|rollback|seed|make NAME   (DATABASE_NAME picks the database)
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";
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
    await k.seed.run();
  } finally {
    await k.destroy();
  }
}

async function main(): Promise<void> {
  const [command, name] = process.argv.slice(2);
  const k = ownerKnex();
  try {
    if (command === "latest") {
      await k.destroy();
      await migrateDatabase();
    } else if (command === "rollback") await k.migrate.rollback();
    else if (command === "seed") await k.seed.run();
    else if (command === "make" && name) console.log(await k.migrate.make(name));
    else {
      console.error("usage: tsx db/migrate.ts latest|rollback|seed|make NAME");
      process.exitCode = 2;
    }
  } finally {
    await k.destroy();
  }
}

if (process.argv[1]?.endsWith("migrate.ts")) void main();
