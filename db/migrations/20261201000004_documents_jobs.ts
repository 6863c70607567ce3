import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

// Documents (one row per original kept in the bucket) and the background job queue.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("documents", (t) => {
    t.increments("id").primary();
    t.specificType("sha256", "CHAR(64)").notNullable().unique(); // an exact duplicate is never stored twice
    t.string("original_name", 255).notNullable();
    t.string("media_type", 100).notNullable();
    t.bigInteger("size_bytes").unsigned().notNullable();
    t.string("storage_key", 200).notNullable().unique();
    // Reading: reading → ready | unreadable. Filing state lives in the filed_* columns.
    t.enu("status", ["reading", "ready", "unreadable"]).notNullable().defaultTo("reading");
    t.string("unreadable_code", 40).nullable();
    t.string("unreadable_reason", 600).nullable();
    t.specificType("text", "LONGTEXT").nullable();
    t.integer("page_count").unsigned().nullable();
    t.boolean("ocr_used").notNullable().defaultTo(false);
    t.integer("ocr_pages").unsigned().notNullable().defaultTo(0);
    t.integer("char_count").unsigned().nullable();
    t.integer("read_ms").unsigned().nullable();
    t.integer("ssn_count").unsigned().notNullable().defaultTo(0);
    t.integer("routing_count").unsigned().notNullable().defaultTo(0);
    t.integer("card_count").unsigned().notNullable().defaultTo(0);
    t.integer("uploaded_by").unsigned().notNullable().references("users.id");
    t.dateTime("uploaded_at").notNullable().defaultTo(knex.fn.now());
    t.dateTime("read_at").nullable();
    t.integer("matter_id").unsigned().nullable().references("matters.id");
    t.integer("cabinet_type_id").unsigned().nullable().references("cabinet_types.id");
    t.integer("filed_by").unsigned().nullable().references("users.id");
    t.dateTime("filed_at").nullable();
    t.enu("filed_how", ["accepted", "refiled", "by_hand", "auto"]).nullable();
    t.boolean("legal_hold").notNullable().defaultTo(false);
    t.index(["status", "uploaded_at"]);
    t.index(["uploaded_by", "uploaded_at"]);
    t.index(["matter_id", "cabinet_type_id"]);
  });
  await knex.raw("ALTER TABLE documents ADD FULLTEXT INDEX documents_text_fulltext (original_name, text)");

  await knex.schema.createTable("jobs", (t) => {
    t.bigIncrements("id").primary();
    t.string("kind", 40).notNullable(); // "read", later "suggest", "train"
    t.integer("document_id").unsigned().nullable().references("documents.id").onDelete("CASCADE");
    t.json("payload").nullable();
    t.enu("status", ["queued", "running", "done", "failed"]).notNullable().defaultTo("queued");
    t.integer("attempts").unsigned().notNullable().defaultTo(0);
    t.integer("max_attempts").unsigned().notNullable().defaultTo(5);
    t.dateTime("run_after", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    // A claimed job carries a lease; when its worker dies, the lease runs out and another takes it.
    t.dateTime("leased_until", { precision: 3 }).nullable();
    t.string("leased_by", 80).nullable();
    t.string("last_error", 1000).nullable();
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.dateTime("finished_at", { precision: 3 }).nullable();
    t.index(["status", "run_after"]);
    t.index(["status", "leased_until"]);
  });
  await grantApp(knex, ["documents", "jobs"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["documents", "jobs"]);
  await knex.schema.dropTable("jobs");
  await knex.schema.dropTable("documents");
}
