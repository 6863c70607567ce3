import type { Knex } from "knex";
import { READ_WRITE, grantApp, revokeApp } from "../grants";

// Rate limits kept in the database, so every app instance counts against the same numbers
// (lib/data/rate-limit.ts). One row per rule and subject (an e-mail address, a client address,
// a one-time link's hash, a user id) for the current fixed window.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limits", (t) => {
    t.string("rule", 40).notNullable();
    t.string("subject", 191).notNullable();
    t.integer("hits").unsigned().notNullable();
    t.dateTime("window_ends_at", { precision: 3 }).notNullable();
    t.primary(["rule", "subject"]);
    t.index(["window_ends_at"]);
  });
  await grantApp(knex, ["rate_limits"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["rate_limits"]);
  await knex.schema.dropTableIfExists("rate_limits");
}
