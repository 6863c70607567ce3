import "server-only";
// How many documents a change would touch, said before it is saved (issue 11): a cabinet type's
// new retention rule, or a matter's new closing date (empty: the matter open again). Setup's
// forms call these through GET /api/retention/impact; both go through the ethical wall.
import { getDb } from "@/db";
import { whereMatterVisible } from "@/lib/data/document-access";
import { retentionDocuments } from "@/lib/data/disposal";
import { heldSql } from "@/lib/data/retention-sql";
import type { CurrentUser } from "@/lib/data/users";
import { notFound } from "@/lib/errors";
import { retentionDate, utcDay, type RetentionFacts, type RetentionRule, type RetentionTrigger } from "@/lib/records/retention-date";
import { retentionImpact, type RetentionImpact } from "@/lib/records/retention-impact";

export interface ImpactAnswer extends RetentionImpact {
  /** Of the newly due documents, those under a legal hold (they stay until it is lifted). */
  newlyDueHeld: number;
}

type Row = Record<string, unknown>;
const day = (v: unknown) => (v ? utcDay(v as string) : null);

async function documentsWhere(user: CurrentUser, column: "d.cabinet_type_id" | "d.matter_id", id: number): Promise<Row[]> {
  const db = getDb();
  return retentionDocuments(db, user)
    .where(column, id)
    .select("d.filed_at", "m.status", "m.closed_on", "c.retention_years", "c.retention_trigger")
    .select(db.raw(`${heldSql()} AS held`));
}

const ruleOf = (r: Row): RetentionRule => ({ years: r.retention_years === null ? null : Number(r.retention_years), trigger: r.retention_trigger as RetentionTrigger });
const factsOf = (r: Row): RetentionFacts => ({ filedOn: day(r.filed_at), matterStatus: (r.status as "open" | "closed" | null) ?? null, matterClosedOn: day(r.closed_on) });

function answer(rows: Row[], before: (r: Row) => string | null, after: (r: Row) => string | null, today: string): ImpactAnswer {
  const pairs = rows.map((r) => ({ before: before(r), after: after(r), held: Boolean(Number(r.held)) }));
  const impact = retentionImpact(pairs, today);
  const newlyDueHeld = retentionImpact(pairs.filter((p) => p.held), today).newlyDue;
  return { ...impact, newlyDueHeld };
}

export async function impactOfTypeRule(user: CurrentUser, input: { cabinetTypeId: number; trigger: RetentionTrigger; years?: number }, today = utcDay(new Date())): Promise<ImpactAnswer> {
  if (!(await getDb()("cabinet_types").where({ id: input.cabinetTypeId }).first("id"))) throw notFound("That cabinet type");
  const next: RetentionRule = { trigger: input.trigger, years: input.trigger === "permanent" ? null : (input.years ?? null) };
  const rows = await documentsWhere(user, "d.cabinet_type_id", input.cabinetTypeId);
  return answer(rows, (r) => retentionDate(ruleOf(r), factsOf(r)).dueOn, (r) => retentionDate(next, factsOf(r)).dueOn, today);
}

/** closedOn null: the matter would be open (reopened), so its after-closing dates go away. */
export async function impactOfClosingDate(user: CurrentUser, input: { matterId: number; closedOn: string | null }, today = utcDay(new Date())): Promise<ImpactAnswer> {
  if (!(await whereMatterVisible(getDb()("matters as m").where("m.id", input.matterId), user, "m").first("m.id"))) throw notFound("That matter");
  const rows = await documentsWhere(user, "d.matter_id", input.matterId);
  const after = (r: Row) => retentionDate(ruleOf(r), { ...factsOf(r), matterStatus: input.closedOn ? "closed" : "open", matterClosedOn: input.closedOn }).dueOn;
  return answer(rows, (r) => retentionDate(ruleOf(r), factsOf(r)).dueOn, after, today);
}
