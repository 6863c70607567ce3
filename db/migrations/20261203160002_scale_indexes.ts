import type { Knex } from "knex";

// Indexes for the lists at 100,000 documents (issue 14; tests/integration/query-plans.test.ts
// checks with EXPLAIN that the lists use them):
// - Cabinets' counts per matter and cabinet type read (matter_id, cabinet_type_id, filed_at) alone
//   (a covering index: no document row is touched to count);
// - a matter's filed documents, newest first, read (matter_id, filed_at) in order.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("documents", (t) => {
    t.index(["matter_id", "cabinet_type_id", "filed_at"], "documents_matter_type_filed_index");
    t.index(["matter_id", "filed_at"], "documents_matter_filed_index");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("documents", (t) => {
    t.dropIndex(["matter_id", "cabinet_type_id", "filed_at"], "documents_matter_type_filed_index");
    t.dropIndex(["matter_id", "filed_at"], "documents_matter_filed_index");
  });
}
