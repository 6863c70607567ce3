import type { Knex } from "knex";
import { APPEND_ONLY, grantApp, revokeApp } from "../grants";

// 1. The ethical wall's memory: every matter a document was ever linked to (filed into,
//    suggested into, a matter candidate of, moved from or to). A document linked to a restricted
//    matter stays behind that matter's wall even after it moves out. Append-only: a link is history.
// 2. The setup record: every change to cabinet types, clients, matters, teams and people.
// 3. filing_events.action and documents.filed_how become strings checked in code (one module
//    writes them), so new actions (moved, undone, imported, disposed …) need no ALTER of an ENUM.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("document_matter_links", (t) => {
    t.integer("document_id").unsigned().notNullable().references("documents.id");
    t.integer("matter_id").unsigned().notNullable().references("matters.id");
    t.string("how", 20).notNullable(); // filed | suggested | candidate | moved — the first link of the pair
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.primary(["document_id", "matter_id"]);
    t.index(["matter_id", "document_id"]);
  });
  await knex.raw(`INSERT IGNORE INTO document_matter_links (document_id, matter_id, how)
    SELECT id, matter_id, 'filed' FROM documents WHERE matter_id IS NOT NULL`);
  await knex.raw(`INSERT IGNORE INTO document_matter_links (document_id, matter_id, how)
    SELECT document_id, top_matter_id, 'suggested' FROM suggestions WHERE top_matter_id IS NOT NULL`);
  await knex.raw(`INSERT IGNORE INTO document_matter_links (document_id, matter_id, how)
    SELECT s.document_id, j.matter_id, 'candidate' FROM suggestions s,
      JSON_TABLE(s.matter_candidates, '$[*]' COLUMNS (matter_id INT PATH '$.matterId')) AS j
    WHERE j.matter_id IS NOT NULL`);
  for (const col of ["from_matter_id", "to_matter_id"]) {
    await knex.raw(`INSERT IGNORE INTO document_matter_links (document_id, matter_id, how)
      SELECT document_id, ${col}, 'moved' FROM filing_events WHERE ${col} IS NOT NULL`);
  }

  await knex.schema.createTable("setup_events", (t) => {
    t.bigIncrements("id").primary();
    t.integer("user_id").unsigned().nullable().references("users.id"); // null: Foldwright itself
    t.string("entity", 40).notNullable(); // cabinet_type | client | matter | team | user | sender | settings
    t.integer("entity_id").unsigned().nullable();
    t.string("action", 40).notNullable(); // created | changed | retired | restored | merged | restricted | …
    t.json("before").nullable();
    t.json("after").nullable();
    t.string("reason", 600).nullable();
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["entity", "entity_id", "id"]);
    t.index(["created_at"]);
  });

  await knex.raw("ALTER TABLE filing_events MODIFY action VARCHAR(30) NOT NULL");
  await knex.raw("ALTER TABLE documents MODIFY filed_how VARCHAR(20) NULL");
  await knex.schema.alterTable("filing_events", (t) => t.index(["action", "id"]));

  await grantApp(knex, ["document_matter_links", "setup_events"], APPEND_ONLY);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["document_matter_links", "setup_events"]);
  await knex.schema.alterTable("filing_events", (t) => t.dropIndex(["action", "id"]));
  await knex.raw("ALTER TABLE documents MODIFY filed_how ENUM('accepted','refiled','by_hand','auto') NULL");
  await knex.raw(
    "ALTER TABLE filing_events MODIFY action ENUM('suggested','accepted','refiled','filed_by_hand','auto_filed','confirmed','moved') NOT NULL",
  );
  await knex.schema.dropTable("setup_events");
  await knex.schema.dropTable("document_matter_links");
}
