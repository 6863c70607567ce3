import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

// Archive imports (issue 12): an office's existing folders brought in as filed documents.
// - imports: one per uploaded zip or dropped folder, with what was found, the admin's mapping and
//   where the work stands, so the page can be left and come back to (and any worker can resume).
// - import_files: one per file found, with its folder, its fate and the document it became.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("imports", (t) => {
    t.increments("id").primary();
    t.integer("created_by").unsigned().notNullable().references("users.id");
    t.string("source_name", 255).notNullable(); // the zip's name, or the dropped folder's
    t.enu("source_kind", ["zip", "folder"]).notNullable();
    // The zip itself while the import runs (folders: each file has its own staging key).
    t.string("storage_key", 200).nullable();
    t.bigInteger("size_bytes").unsigned().notNullable().defaultTo(0);
    // proposed → importing (storing) → reading → done; failed when the archive cannot be read at all
    t.string("state", 20).notNullable().defaultTo("proposed");
    t.json("folders").notNullable(); // what was found, with counts and the proposal
    t.json("mapping").nullable(); // what the admin confirmed
    t.integer("confirmed_by").unsigned().nullable().references("users.id");
    t.dateTime("confirmed_at", { precision: 3 }).nullable();
    t.dateTime("finished_at", { precision: 3 }).nullable();
    t.integer("model_version_id").unsigned().nullable(); // the retraining started at the end
    t.string("error", 600).nullable();
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["created_at"]);
  });
  await knex.schema.createTable("import_files", (t) => {
    t.increments("id").primary();
    t.integer("import_id").unsigned().notNullable().references("imports.id").onDelete("CASCADE");
    t.integer("position").unsigned().notNullable(); // order in the archive
    t.string("path", 1000).notNullable(); // inside the archive, after the common root folder
    t.string("type_folder", 255).nullable();
    t.string("matter_folder", 255).nullable();
    t.bigInteger("size_bytes").unsigned().notNullable().defaultTo(0);
    t.string("staging_key", 200).nullable(); // folders: the file as uploaded, until stored
    // waiting → reading → filed | unreadable | duplicate | rejected | skipped
    t.string("state", 20).notNullable().defaultTo("waiting");
    t.integer("document_id").unsigned().nullable().references("documents.id");
    t.string("code", 40).nullable();
    t.string("message", 800).nullable();
    t.dateTime("updated_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.unique(["import_id", "position"]);
    t.index(["import_id", "state"]);
    t.index(["document_id"]);
  });
  await grantApp(knex, ["imports", "import_files"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["imports", "import_files"]);
  await knex.schema.dropTable("import_files");
  await knex.schema.dropTable("imports");
}
