import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

const TABLES = ["clients", "matters", "matter_members"];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("clients", (t) => {
    t.increments("id").primary();
    t.string("name", 200).notNullable().unique();
    t.json("aliases").notNullable(); // other names the client's papers use
    t.json("email_domains").notNullable();
    t.string("tax_id_last4", 4).nullable(); // never the whole tax ID
    t.timestamps(true, true);
  });
  await knex.schema.createTable("matters", (t) => {
    t.increments("id").primary();
    t.integer("client_id").unsigned().notNullable().references("clients.id");
    t.string("number", 40).notNullable().unique();
    t.string("title", 200).notNullable();
    // Restricted = an ethical wall: only the matter's team and admins see anything of it.
    t.boolean("restricted").notNullable().defaultTo(false);
    t.enu("status", ["open", "closed"]).notNullable().defaultTo("open");
    t.date("opened_on").notNullable();
    t.date("closed_on").nullable();
    t.timestamps(true, true);
  });
  await knex.schema.createTable("matter_members", (t) => {
    t.integer("matter_id").unsigned().notNullable().references("matters.id").onDelete("CASCADE");
    t.integer("user_id").unsigned().notNullable().references("users.id").onDelete("CASCADE");
    t.primary(["matter_id", "user_id"]);
  });
  await grantApp(knex, TABLES, READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, TABLES);
  await knex.schema.dropTable("matter_members");
  await knex.schema.dropTable("matters");
  await knex.schema.dropTable("clients");
}
