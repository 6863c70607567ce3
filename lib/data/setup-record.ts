// The one writer of the setup record (setup_events, append-only: the app's database user has
// INSERT and SELECT only). Every create, change, retire, merge, restriction, team change and
// change to a person is written here inside the caller's transaction, with before → after.
import type { Knex } from "knex";

export type SetupEntity = "cabinet_type" | "client" | "matter" | "team" | "user" | "sender" | "settings";

export interface NewSetupEvent {
  userId: number | null; // null: Foldwright itself
  entity: SetupEntity;
  entityId: number | null;
  action: string; // created | changed | retired | restored | merged | restricted | invited | …
  before?: unknown;
  after?: unknown;
  reason?: string | null;
}

const REASON_MAX = 600;

export async function appendSetupEvent(db: Knex | Knex.Transaction, e: NewSetupEvent): Promise<number> {
  const [id] = await db("setup_events").insert({
    user_id: e.userId,
    entity: e.entity,
    entity_id: e.entityId,
    action: e.action.slice(0, 40),
    before: e.before === undefined ? null : JSON.stringify(e.before),
    after: e.after === undefined ? null : JSON.stringify(e.after),
    reason: e.reason ? e.reason.slice(0, REASON_MAX) : null,
  });
  return Number(id);
}
