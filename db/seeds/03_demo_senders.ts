// The demo office allows scans by e-mail from its own domain; they are filed as the demo clerk,
// who looks after the copier. Runs twice without harm (matched on the pattern).
import type { Knex } from "knex";

export const DEMO_SENDER_DOMAIN = "alderquay.example";
const FILES_AS = "clerk@example.com";

export async function seed(knex: Knex): Promise<void> {
  const clerk = await knex("users").where({ email: FILES_AS }).first("id");
  if (!clerk) return;
  await knex("allowed_senders")
    .insert({ pattern: DEMO_SENDER_DOMAIN, kind: "domain", files_as_user_id: clerk.id, note: "The office's own domain (the copier and staff mailboxes)." })
    .onConflict("pattern")
    .ignore();
}
