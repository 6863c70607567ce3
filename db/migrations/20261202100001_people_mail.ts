import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

// People and e-mail (issue 10):
// - users: an invited person has no password yet (password_hash NULL) until they accept; notices
//   each person can switch off.
// - account_tokens: one-time links (invitation 72 h, password reset 1 h), stored as SHA-256 hashes.
// - mail_log: one row per outgoing message with its state; the content waits sealed (it may
//   carry a one-time link) until it is sent.
// - allowed_senders, mail_intake_messages, mail_intake_attachments: scans that arrive by e-mail.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE users MODIFY password_hash VARCHAR(100) NULL");
  await knex.schema.alterTable("users", (t) => {
    t.dateTime("invited_at").nullable();
    t.boolean("notify_digest").notNullable().defaultTo(true);
    t.boolean("notify_retrain").notNullable().defaultTo(true);
    t.boolean("notify_scan_receipt").notNullable().defaultTo(true);
  });

  await knex.schema.createTable("account_tokens", (t) => {
    t.increments("id").primary();
    t.integer("user_id").unsigned().notNullable().references("users.id");
    t.string("purpose", 20).notNullable(); // invitation | reset
    t.specificType("token_hash", "CHAR(64)").notNullable().unique();
    t.dateTime("expires_at", { precision: 3 }).notNullable();
    t.dateTime("used_at", { precision: 3 }).nullable(); // also set when a newer link replaces it
    t.integer("created_by").unsigned().nullable().references("users.id");
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["user_id", "purpose"]);
  });

  await knex.schema.createTable("mail_log", (t) => {
    t.bigIncrements("id").primary();
    t.string("kind", 30).notNullable(); // invitation | reset | digest | retrain_alert | scan_receipt
    t.string("to_address", 254).notNullable();
    t.integer("user_id").unsigned().nullable().references("users.id");
    t.string("subject", 300).notNullable();
    t.string("state", 12).notNullable().defaultTo("queued"); // queued | sent | failed
    t.integer("attempts").unsigned().notNullable().defaultTo(0);
    t.string("last_error", 1000).nullable();
    t.string("message_id", 250).nullable();
    t.specificType("sealed", "MEDIUMTEXT").nullable(); // cleared once sent
    t.string("dedupe_key", 120).nullable().unique(); // one digest per person per day, one alert per version
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.dateTime("sent_at", { precision: 3 }).nullable();
    t.index(["state", "id"]);
  });

  await knex.schema.createTable("allowed_senders", (t) => {
    t.increments("id").primary();
    t.string("pattern", 254).notNullable().unique(); // an address (a@b.example) or a domain (b.example)
    t.string("kind", 10).notNullable(); // address | domain
    t.integer("files_as_user_id").unsigned().notNullable().references("users.id");
    t.string("note", 200).nullable();
    t.integer("created_by").unsigned().nullable().references("users.id");
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
  });

  await knex.schema.createTable("mail_intake_messages", (t) => {
    t.increments("id").primary();
    t.string("envelope_from", 254).notNullable();
    t.string("subject", 300).nullable();
    t.integer("uploaded_by").unsigned().notNullable().references("users.id");
    t.string("raw_key", 200).nullable(); // the raw message in the bucket, removed once every attachment is settled
    t.integer("size_bytes").unsigned().notNullable();
    t.integer("attachment_count").unsigned().notNullable();
    t.string("state", 12).notNullable().defaultTo("received"); // received | done
    t.dateTime("received_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.dateTime("done_at", { precision: 3 }).nullable();
  });

  await knex.schema.createTable("mail_intake_attachments", (t) => {
    t.increments("id").primary();
    t.integer("message_id").unsigned().notNullable().references("mail_intake_messages.id");
    t.integer("part_index").unsigned().notNullable();
    t.string("file_name", 255).notNullable();
    t.string("fate", 12).notNullable(); // reading | duplicate | rejected
    t.integer("document_id").unsigned().nullable().references("documents.id");
    t.string("code", 40).nullable();
    t.string("message", 600).nullable();
    t.unique(["message_id", "part_index"]);
    t.index(["document_id"]);
  });

  await grantApp(knex, ["account_tokens", "mail_log", "allowed_senders", "mail_intake_messages", "mail_intake_attachments"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["account_tokens", "mail_log", "allowed_senders", "mail_intake_messages", "mail_intake_attachments"]);
  await knex.schema.dropTable("mail_intake_attachments");
  await knex.schema.dropTable("mail_intake_messages");
  await knex.schema.dropTable("allowed_senders");
  await knex.schema.dropTable("mail_log");
  await knex.schema.dropTable("account_tokens");
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("invited_at");
    t.dropColumn("notify_digest");
    t.dropColumn("notify_retrain");
    t.dropColumn("notify_scan_receipt");
  });
  await knex.raw("UPDATE users SET password_hash = '!' WHERE password_hash IS NULL");
  await knex.raw("ALTER TABLE users MODIFY password_hash VARCHAR(100) NOT NULL");
}
