import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("cabinet_types", (t) => {
    t.increments("id").primary();
    t.string("name", 120).notNullable().unique();
    t.text("description").notNullable();
    t.json("keywords").notNullable();
    // Retention: null years with trigger "permanent" means keep until a person decides otherwise.
    t.integer("retention_years").unsigned().nullable();
    t.enu("retention_trigger", ["after_filing", "after_matter_close", "permanent"]).notNullable();
    t.string("retention_source", 400).notNullable(); // where the default comes from
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamps(true, true);
  });
  await grantApp(knex, ["cabinet_types"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["cabinet_types"]);
  await knex.schema.dropTable("cabinet_types");
}
