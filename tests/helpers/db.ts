// Knex connections for tests: as the database owner (to arrange data) and as the app user.
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";
import { env } from "@/lib/env";

export function ownerDb(database = env.db.name): Knex {
  return knex(knexConfig("owner", database));
}

export function appDb(database = env.db.name): Knex {
  return knex(knexConfig("app", database));
}
