import "server-only";
// The name each event had. The filing record stores cabinet type and matter ids, so a rename
// would otherwise rewrite history when the record is read. The setup record keeps every rename
// (before.name → after.name for cabinet types, before.number → after.number for matters, with
// its time), so the name a type or matter had at any moment is: the `before` of the first rename
// after that moment, or the current name when none came after. Nothing is copied onto the
// append-only filing record, and older rows need no migration.
import type { Knex } from "knex";
import { parseJson } from "@/lib/data/setup-shared";

type Entity = "cabinet_type" | "matter";
const FIELD: Record<Entity, string> = { cabinet_type: "name", matter: "number" };

/** Renames of one entity, oldest first: until `at` the entity was called `before`. */
export type NameHistory = Map<string, { at: number; before: string }[]>;

export async function loadNameHistory(db: Knex, entity: Entity, ids: number[]): Promise<NameHistory> {
  const out: NameHistory = new Map();
  const wanted = [...new Set(ids.filter((id) => Number.isInteger(id) && id > 0))];
  if (wanted.length === 0) return out;
  const path = `$.${FIELD[entity]}`;
  const rows = await db("setup_events")
    .where({ entity })
    .whereIn("entity_id", wanted)
    .whereRaw("JSON_UNQUOTE(JSON_EXTRACT(`before`, ?)) <> JSON_UNQUOTE(JSON_EXTRACT(`after`, ?))", [path, path])
    .orderBy("id")
    .select("entity_id", "before", "created_at");
  for (const r of rows) {
    const before = parseJson<Record<string, unknown>>(r.before, {})[FIELD[entity]];
    if (typeof before !== "string") continue;
    const key = `${entity}:${r.entity_id}`;
    out.set(key, [...(out.get(key) ?? []), { at: new Date(r.created_at).getTime(), before }]);
  }
  return out;
}

/** The name entity `id` had at time `at`; `current` when it was never renamed after. */
export function nameAt(history: NameHistory, entity: Entity, id: number | null, at: Date, current: string | null): string | null {
  if (id === null || current === null) return current;
  const renames = history.get(`${entity}:${id}`);
  const later = renames?.find((r) => r.at > at.getTime());
  return later ? later.before : current;
}
