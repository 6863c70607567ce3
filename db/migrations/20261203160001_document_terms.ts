import type { Knex } from "knex";
import { grantApp, READ_WRITE, revokeApp } from "../grants";

// Each read document's term counts, tokenised once (lib/data/document-terms.ts): a retraining
// builds TF-IDF from these and never re-tokenises. `tokenizer_version` is lib/ml's
// TOKENIZER_VERSION when they were made; rows with another one are re-tokenised by "tokenize"
// jobs. `has_letter`: the text holds a letter (documents without one are not trained on).
// A disposed document's counts go with its text (they would tell what it said).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("document_terms", (t) => {
    t.integer("document_id").unsigned().notNullable().primary().references("documents.id").onDelete("CASCADE");
    t.smallint("tokenizer_version").unsigned().notNullable();
    t.boolean("has_letter").notNullable();
    t.integer("distinct_terms").unsigned().notNullable();
    t.specificType("counts", "MEDIUMTEXT").notNullable(); // JSON [[term, count], …]
    t.dateTime("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["tokenizer_version", "document_id"]);
  });
  await grantApp(knex, ["document_terms"], READ_WRITE);
}

export async function down(knex: Knex): Promise<void> {
  await revokeApp(knex, ["document_terms"]);
  await knex.schema.dropTable("document_terms");
}
