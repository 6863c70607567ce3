import type { Knex } from "knex";
import { APPEND_ONLY, grantApp, READ_WRITE, revokeApp } from "../grants";

// Records (issue 11): legal holds with their append-only record, disposal batches with the
// documents each proposes, and the tombstone columns a disposed document keeps.
// - legal_holds: one row per hold; lifting it fills the released_* columns (the state screens read).
// - hold_events: every place and lift, append-only (the app user may only SELECT and INSERT).
// - disposal_batches / disposal_batch_items: a proposal, its decision, and per document the rule
//   that made it due and what happened to it, copied at proposal so the certificate never depends
//   on a cabinet type that changed later.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("legal_holds", (t) => {
    t.increments("id").primary();
    t.integer("matter_id").unsigned().nullable().references("matters.id"); // a hold on a matter…
    t.integer("document_id").unsigned().nullable().references("documents.id"); // …or on one document
    t.string("reason", 600).notNullable();
    t.string("reference", 120).notNullable(); // a case or request number
    t.integer("placed_by").unsigned().notNullable().references("users.id");
    t.dateTime("placed_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.integer("released_by").unsigned().nullable().references("users.id");
    t.dateTime("released_at", { precision: 3 }).nullable();
    t.string("release_reason", 600).nullable();
    t.index(["matter_id", "released_at"]);
    t.index(["document_id", "released_at"]);
  });
  await knex.raw("ALTER TABLE legal_holds ADD CONSTRAINT legal_holds_one_target CHECK ((matter_id IS NULL) <> (document_id IS NULL))");

  await knex.schema.createTable("hold_events", (t) => {
    t.bigIncrements("id").primary();
    t.integer("hold_id").unsigned().notNullable().references("legal_holds.id");
    t.string("action", 20).notNullable(); // placed | released
    t.integer("user_id").unsigned().notNullable().references("users.id");
    t.string("reason", 600).notNullable();
    t.string("reference", 120).nullable();
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["hold_id", "id"]);
  });

  await knex.schema.createTable("disposal_batches", (t) => {
    t.increments("id").primary();
    t.string("status", 20).notNullable().defaultTo("proposed"); // proposed | approved | rejected
    t.string("note", 1000).notNullable();
    t.integer("proposed_by").unsigned().notNullable().references("users.id");
    t.dateTime("proposed_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.integer("decided_by").unsigned().nullable().references("users.id");
    t.dateTime("decided_at", { precision: 3 }).nullable();
    t.string("decision_reason", 600).nullable(); // why it was rejected
    t.index(["status", "id"]);
  });

  await knex.schema.createTable("disposal_batch_items", (t) => {
    t.integer("batch_id").unsigned().notNullable().references("disposal_batches.id");
    t.integer("document_id").unsigned().notNullable().references("documents.id");
    t.string("outcome", 20).notNullable().defaultTo("proposed"); // proposed | disposed | kept_hold | kept_not_due | rejected
    t.integer("retention_years").unsigned().nullable();
    t.string("retention_trigger", 30).notNullable();
    t.string("retention_source", 400).notNullable();
    t.date("due_on").notNullable();
    t.dateTime("object_deleted_at", { precision: 3 }).nullable(); // the original removed from the bucket
    t.primary(["batch_id", "document_id"]);
    t.index(["document_id", "outcome"]);
  });

  await knex.schema.alterTable("documents", (t) => {
    t.dateTime("disposed_at", { precision: 3 }).nullable();
    t.integer("disposal_batch_id").unsigned().nullable().references("disposal_batches.id");
    t.index(["disposed_at"]);
  });
  // "An exact duplicate is never stored twice" holds for documents still kept: a tombstone keeps
  // its hash, and the same file uploaded after its disposal is a new document, not a duplicate.
  await knex.schema.alterTable("documents", (t) => t.dropUnique(["sha256"]));
  // RTRIM: MariaDB refuses a generated column that reads a CHAR as is (its value would depend on
  // the PAD_CHAR_TO_FULL_LENGTH mode); a hex hash has no trailing spaces, so RTRIM changes nothing.
  await knex.raw("ALTER TABLE documents ADD COLUMN live_sha256 VARCHAR(64) AS (IF(disposed_at IS NULL, RTRIM(sha256), NULL)) PERSISTENT, ADD UNIQUE INDEX documents_live_sha256_unique (live_sha256), ADD INDEX documents_sha256_index (sha256)");

  await grantApp(knex, ["legal_holds", "disposal_batches", "disposal_batch_items"], READ_WRITE);
  await grantApp(knex, ["hold_events"], APPEND_ONLY);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["legal_holds", "hold_events", "disposal_batches", "disposal_batch_items"]);
  // Fails if a disposed file was stored again since; that history cannot go back to one row per hash.
  await knex.raw("ALTER TABLE documents DROP INDEX documents_live_sha256_unique, DROP INDEX documents_sha256_index, DROP COLUMN live_sha256, ADD UNIQUE INDEX documents_sha256_unique (sha256)");
  await knex.schema.alterTable("documents", (t) => {
    t.dropForeign(["disposal_batch_id"]);
    t.dropIndex(["disposed_at"]);
    t.dropColumn("disposal_batch_id");
    t.dropColumn("disposed_at");
  });
  await knex.schema.dropTable("disposal_batch_items");
  await knex.schema.dropTable("disposal_batches");
  await knex.schema.dropTable("hold_events");
  await knex.schema.dropTable("legal_holds");
}
