import type { Knex } from "knex";
import { APPEND_ONLY, grantApp, READ_WRITE, revokeApp } from "../grants";

// The filing loop: model versions, suggestions, the append-only filing record, office settings.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("model_versions", (t) => {
    t.increments("id").primary();
    t.enu("status", ["training", "candidate", "current", "rejected", "retired", "failed"]).notNullable().defaultTo("training");
    t.enu("trigger", ["nightly", "manual", "start"]).notNullable();
    t.integer("requested_by").unsigned().nullable().references("users.id");
    t.json("params").nullable();
    t.json("class_list").nullable(); // cabinet type ids the model learned
    t.integer("vocabulary_size").unsigned().nullable();
    t.integer("train_count").unsigned().nullable();
    t.json("class_counts").nullable();
    t.json("metrics").nullable(); // cross-validated report
    t.decimal("macro_f1", 6, 4).nullable();
    t.decimal("accuracy", 6, 4).nullable();
    t.decimal("compared_macro_f1", 6, 4).nullable(); // the current model's score on the same folds
    t.decimal("autofile_threshold", 6, 4).nullable();
    t.decimal("autofile_share", 6, 4).nullable();
    t.decimal("autofile_target", 6, 4).nullable();
    t.integer("duration_ms").unsigned().nullable();
    t.string("artifact_key", 200).nullable();
    t.integer("artifact_bytes").unsigned().nullable();
    t.string("progress", 200).nullable();
    t.string("reason", 600).nullable(); // why promoted, rejected or failed
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.dateTime("finished_at", { precision: 3 }).nullable();
    t.dateTime("promoted_at", { precision: 3 }).nullable();
    t.integer("promoted_by").unsigned().nullable().references("users.id");
    t.index(["status"]);
  });

  await knex.schema.createTable("suggestions", (t) => {
    t.increments("id").primary();
    t.integer("document_id").unsigned().notNullable().references("documents.id").onDelete("CASCADE");
    t.integer("model_version_id").unsigned().nullable().references("model_versions.id");
    t.enu("method", ["model", "cold_start", "blended"]).notNullable();
    t.json("ranked").notNullable(); // [{cabinetTypeId, confidence, probability, source}]
    t.integer("top_cabinet_type_id").unsigned().nullable().references("cabinet_types.id");
    t.decimal("top_confidence", 6, 4).nullable();
    // The model's own confidence in the top type, before description ranks were blended in:
    // what the auto-file bar (measured on the model alone) is compared with.
    t.decimal("model_confidence", 6, 4).nullable();
    t.boolean("no_confident_match").notNullable().defaultTo(false);
    t.json("why").notNullable(); // [{term, weight}]
    t.json("matter_candidates").notNullable(); // [{matterId, score, reasons}]
    t.integer("top_matter_id").unsigned().nullable().references("matters.id");
    t.boolean("matter_ambiguous").notNullable().defaultTo(true);
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["document_id", "id"]);
  });

  await knex.schema.createTable("filing_events", (t) => {
    t.bigIncrements("id").primary();
    t.integer("document_id").unsigned().notNullable().references("documents.id");
    t.integer("user_id").unsigned().nullable().references("users.id"); // null: Foldwright itself
    t.enu("action", ["suggested", "accepted", "refiled", "filed_by_hand", "auto_filed", "confirmed", "moved"]).notNullable();
    t.integer("from_cabinet_type_id").unsigned().nullable().references("cabinet_types.id");
    t.integer("to_cabinet_type_id").unsigned().nullable().references("cabinet_types.id");
    t.integer("from_matter_id").unsigned().nullable().references("matters.id");
    t.integer("to_matter_id").unsigned().nullable().references("matters.id");
    t.integer("model_version_id").unsigned().nullable().references("model_versions.id");
    t.decimal("confidence", 6, 4).nullable();
    t.string("reason", 600).nullable();
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["document_id", "id"]);
    t.index(["created_at"]);
  });

  await knex.schema.createTable("office_settings", (t) => {
    t.integer("id").unsigned().primary(); // always 1
    t.boolean("auto_file_enabled").notNullable().defaultTo(false);
    t.decimal("auto_file_target", 6, 4).notNullable().defaultTo(0.98);
    t.integer("min_examples_per_type").unsigned().notNullable().defaultTo(5);
    t.integer("updated_by").unsigned().nullable().references("users.id");
    t.dateTime("updated_at").nullable();
  });
  await knex("office_settings").insert({ id: 1 });

  await knex.schema.alterTable("documents", (t) => {
    // Auto-filed documents become training labels only once a person confirms them.
    t.integer("confirmed_by").unsigned().nullable().references("users.id");
    t.dateTime("confirmed_at").nullable();
    t.index(["filed_at"]);
  });

  await grantApp(knex, ["model_versions", "suggestions", "office_settings"], READ_WRITE);
  // The filing record is append-only: the application may read and add, never change or remove.
  await grantApp(knex, ["filing_events"], APPEND_ONLY);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["model_versions", "suggestions", "office_settings", "filing_events"]);
  await knex.schema.alterTable("documents", (t) => {
    t.dropForeign(["confirmed_by"]);
    t.dropIndex(["filed_at"]);
    t.dropColumn("confirmed_by");
    t.dropColumn("confirmed_at");
  });
  await knex.schema.dropTable("office_settings");
  await knex.schema.dropTable("filing_events");
  await knex.schema.dropTable("suggestions");
  await knex.schema.dropTable("model_versions");
}
