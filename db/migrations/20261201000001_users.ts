import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("users", (t) => {
    t.increments("id").primary();
    t.string("email", 254).notNullable().unique();
    t.string("name", 120).notNullable();
    t.enu("role", ["clerk", "partner", "admin", "auditor"]).notNullable();
    t.string("password_hash", 100).notNullable();
    t.boolean("active").notNullable().defaultTo(true);
    // Lockout after repeated wrong passwords (SIGN_IN_MAX_FAILURES, SIGN_IN_LOCK_MINUTES).
    t.integer("failed_sign_ins").unsigned().notNullable().defaultTo(0);
    t.dateTime("locked_until").nullable();
    t.dateTime("last_sign_in_at").nullable();
    // Sealed cookies carry the epoch they were issued in; sign-out bumps it, so a copied
    // cookie stops working on every device at once.
    t.integer("session_epoch").unsigned().notNullable().defaultTo(0);
    t.timestamps(true, true);
  });
  await grantApp(knex, ["users"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["users"]);
  await knex.schema.dropTable("users");
}
