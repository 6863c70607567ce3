import type { Knex } from "knex";

// Undo on the filing record (issue 15). An undo is its own event ("undone") that names the event
// it reverses; nothing is ever deleted. Each decision also keeps where the document stood before
// it (`prior_filing`: cabinet type, matter, who filed it and how, the spot-check), so an undo
// puts back exactly that — the queue for a first filing, the earlier cabinet for a move.
// The unique index lets an event be reversed once only, even by two clicks at the same moment.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("filing_events", (t) => {
    t.bigInteger("reverses_event_id").unsigned().nullable().references("filing_events.id");
    t.json("prior_filing").nullable();
    t.unique(["reverses_event_id"], { indexName: "filing_events_reverses_unique" });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("filing_events", (t) => {
    t.dropForeign(["reverses_event_id"]);
    t.dropUnique(["reverses_event_id"], "filing_events_reverses_unique");
    t.dropColumn("reverses_event_id");
    t.dropColumn("prior_filing");
  });
}
