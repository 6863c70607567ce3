// Demo data: the invented office, its people (the demo sign-ins), clients, matters and cabinet
// types. Runs twice without harm: rows are matched on their natural keys.
import type { Knex } from "knex";
import { DEMO_CABINET_TYPES } from "../demo/cabinet-types";
import { DEMO_CLIENTS, DEMO_MATTERS, DEMO_USERS } from "../demo/office";
import { hashPassword } from "../../lib/auth/password";
import { env } from "../../lib/env";

export async function seed(knex: Knex): Promise<void> {
  const hash = await hashPassword(env.demoPassword);
  for (const u of DEMO_USERS) {
    await knex("users")
      .insert({ email: u.email, name: u.name, role: u.role, password_hash: hash })
      .onConflict("email")
      .merge({ name: u.name, role: u.role, password_hash: hash, failed_sign_ins: 0, locked_until: null });
  }
  for (const c of DEMO_CLIENTS) {
    await knex("clients")
      .insert({ name: c.name, aliases: JSON.stringify(c.aliases), email_domains: JSON.stringify(c.emailDomains), tax_id_last4: c.taxIdLast4 })
      .onConflict("name")
      .merge();
  }
  for (const m of DEMO_MATTERS) {
    const client = await knex("clients").where({ name: m.client }).first("id");
    await knex("matters")
      .insert({ number: m.number, client_id: client.id, title: m.title, restricted: m.restricted, opened_on: "2026-01-05" })
      .onConflict("number")
      .merge(["title", "restricted", "client_id"]);
    const matter = await knex("matters").where({ number: m.number }).first("id");
    const members = await knex("users").whereIn("email", m.team).select("id");
    await knex("matter_members").where({ matter_id: matter.id }).delete();
    await knex("matter_members").insert(members.map((u: { id: number }) => ({ matter_id: matter.id, user_id: u.id })));
  }
  for (const t of DEMO_CABINET_TYPES) {
    await knex("cabinet_types")
      .insert({
        name: t.name,
        description: t.description,
        keywords: JSON.stringify(t.keywords),
        retention_years: t.retentionYears,
        retention_trigger: t.retentionTrigger,
        retention_source: t.retentionSource,
      })
      .onConflict("name")
      .merge(["description", "keywords", "retention_years", "retention_trigger", "retention_source"]);
  }
}
