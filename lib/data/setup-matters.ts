import "server-only";
// Setup of matters and their teams. Every change writes its setup event in the same
// transaction: the matter's own fields as "created" / "changed" / "restricted" / "unrestricted" /
// "closed" / "reopened", and each person added to or removed from a team as a "team" event.
// The wall (lib/data/document-access.ts) reads matters.restricted and matter_members on every
// request, so a change here reaches everyone's next request.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { AppError, badInput, notFound } from "@/lib/errors";
import { whereMatterVisible } from "@/lib/data/document-access";
import { appendSetupEvent } from "@/lib/data/setup-record";
import { changedFields, isDuplicateKey, toDay } from "@/lib/data/setup-shared";
import type { CurrentUser } from "@/lib/data/users";
import { matterSchema, type MatterInput, type MatterPatch } from "@/lib/validations/setup";

export interface TeamMember {
  id: number;
  name: string;
  email: string;
}

export interface Matter {
  id: number;
  clientId: number;
  clientName: string;
  number: string;
  title: string;
  restricted: boolean;
  status: "open" | "closed";
  openedOn: string;
  closedOn: string | null;
  team: TeamMember[];
}

type Db = Knex | Knex.Transaction;

async function teamsOf(db: Db, matterIds: number[]): Promise<Map<number, TeamMember[]>> {
  const out = new Map<number, TeamMember[]>();
  if (matterIds.length === 0) return out;
  const rows = await db("matter_members as mm").join("users as u", "u.id", "mm.user_id").whereIn("mm.matter_id", matterIds).orderBy("u.name").select("mm.matter_id", "u.id", "u.name", "u.email");
  for (const r of rows) out.set(r.matter_id, [...(out.get(r.matter_id) ?? []), { id: r.id, name: r.name, email: r.email }]);
  return out;
}

function matters(db: Db) {
  return db("matters as m")
    .join("clients as c", "c.id", "m.client_id")
    .select("m.id", "m.client_id", "c.name as client_name", "m.number", "m.title", "m.restricted", "m.status", "m.opened_on", "m.closed_on");
}

async function withTeams(db: Db, rows: Record<string, unknown>[]): Promise<Matter[]> {
  const teams = await teamsOf(db, rows.map((r) => Number(r.id)));
  return rows.map((r) => ({
    id: Number(r.id),
    clientId: Number(r.client_id),
    clientName: String(r.client_name),
    number: String(r.number),
    title: String(r.title),
    restricted: Boolean(r.restricted),
    status: r.status as Matter["status"],
    openedOn: toDay(r.opened_on)!,
    closedOn: toDay(r.closed_on),
    team: teams.get(Number(r.id)) ?? [],
  }));
}

/** The matters this user may see, behind the wall; teams are shown to admins only. */
export async function listMatters(user: CurrentUser, opts: { page: number; pageSize: number }): Promise<{ items: Matter[]; total: number }> {
  const db = getDb();
  const q = whereMatterVisible(matters(db), user);
  const [{ total }] = await q.clone().clearSelect().count({ total: "m.id" });
  const rows = await q.orderBy("m.number").limit(opts.pageSize).offset((opts.page - 1) * opts.pageSize);
  const items = await withTeams(db, rows);
  return { items: user.role === "admin" ? items : items.map((m) => ({ ...m, team: [] })), total: Number(total) };
}

async function findMatter(db: Db, id: number): Promise<Matter> {
  const row = await matters(db).where("m.id", id).first();
  if (!row) throw notFound("That matter");
  return (await withTeams(db, [row]))[0];
}

/** People who can be put on a team: every active account of the office. */
export async function listTeamCandidates(): Promise<(TeamMember & { role: string })[]> {
  return getDb()("users").where({ active: true }).orderBy("name").select("id", "name", "email", "role");
}

async function requireClient(db: Db, id: number): Promise<string> {
  const c = await db("clients").where({ id }).first("name");
  if (!c) throw badInput("That client does not exist. Choose a client from the list, or add the client first.");
  return c.name;
}

/** The people of a team; someone who can no longer sign in may stay on a team, never join one. */
async function requireTeam(db: Db, ids: number[], alreadyOn: number[] = []): Promise<TeamMember[]> {
  const unique = [...new Set(ids)];
  const found: (TeamMember & { active: number })[] = unique.length ? await db("users").whereIn("id", unique).select("id", "name", "email", "active") : [];
  const missing = unique.filter((id) => !found.some((u) => u.id === id));
  if (missing.length) throw badInput(`No person with id ${missing.join(", ")} exists in this office. Pick team members from the list of people.`);
  const inactive = found.filter((u) => !u.active && !alreadyOn.includes(u.id));
  if (inactive.length) throw badInput(`${inactive.map((u) => u.name).join(", ")} can no longer sign in. Leave them off the team, or ask an admin to reactivate them.`);
  return found.map(({ id, name, email }) => ({ id, name, email }));
}

async function refuseDuplicateNumber(db: Db, number: string, exceptId?: number): Promise<void> {
  const q = matters(db).where("m.number", number).first();
  if (exceptId) q.whereNot("m.id", exceptId);
  const other = await q;
  if (other) throw duplicateNumber(number, `"${other.title}" for ${other.client_name}`);
}

const duplicateNumber = (number: string, holder = "another matter") =>
  new AppError(409, "duplicate_number", `Matter number ${number} is already used by ${holder}. Matter numbers are unique: choose another number.`);

const toRow = (m: MatterInput) => ({
  client_id: m.clientId,
  number: m.number,
  title: m.title,
  restricted: m.restricted,
  status: m.status,
  opened_on: m.openedOn,
  closed_on: m.closedOn,
});

/** The matter's own fields for the record (the team has its own events). */
const snapshot = (m: Matter | (MatterInput & { clientName: string })) => ({
  clientId: m.clientId,
  client: m.clientName,
  number: m.number,
  title: m.title,
  restricted: m.restricted,
  status: m.status,
  openedOn: m.openedOn,
  closedOn: m.closedOn,
});

function actionOf(before: ReturnType<typeof snapshot>, after: ReturnType<typeof snapshot>): string {
  if (before.restricted !== after.restricted) return after.restricted ? "restricted" : "unrestricted";
  if (before.status !== after.status) return after.status === "closed" ? "closed" : "reopened";
  return "changed";
}

async function writeTeamChanges(trx: Knex.Transaction, user: CurrentUser, matter: { id: number; number: string }, before: TeamMember[], after: TeamMember[]): Promise<void> {
  const had = new Set(before.map((p) => p.id));
  const has = new Set(after.map((p) => p.id));
  const removed = before.filter((p) => !has.has(p.id));
  const added = after.filter((p) => !had.has(p.id));
  if (removed.length) await trx("matter_members").where({ matter_id: matter.id }).whereIn("user_id", removed.map((p) => p.id)).delete();
  if (added.length) await trx("matter_members").insert(added.map((p) => ({ matter_id: matter.id, user_id: p.id })));
  // Each event's before → after is one step, so a reader sees the team as it was after each change.
  let team = before;
  const names = (t: TeamMember[]) => t.map((p) => p.name);
  for (const p of removed) {
    const next = team.filter((m) => m.id !== p.id);
    await appendSetupEvent(trx, { userId: user.id, entity: "team", entityId: matter.id, action: "member_removed", before: { matter: matter.number, member: p.name, memberId: p.id, team: names(team) }, after: { matter: matter.number, team: names(next) } });
    team = next;
  }
  for (const p of added) {
    const next = [...team, p];
    await appendSetupEvent(trx, { userId: user.id, entity: "team", entityId: matter.id, action: "member_added", before: { matter: matter.number, team: names(team) }, after: { matter: matter.number, member: p.name, memberId: p.id, team: names(next) } });
    team = next;
  }
}

export async function createMatter(user: CurrentUser, input: MatterInput): Promise<Matter> {
  try {
    return await getDb().transaction(async (trx) => {
      const clientName = await requireClient(trx, input.clientId);
      const team = await requireTeam(trx, input.team);
      await refuseDuplicateNumber(trx, input.number);
      const [id] = await trx("matters").insert(toRow(input));
      await appendSetupEvent(trx, { userId: user.id, entity: "matter", entityId: Number(id), action: "created", after: snapshot({ ...input, clientName }) });
      await writeTeamChanges(trx, user, { id: Number(id), number: input.number }, [], team);
      return findMatter(trx, Number(id));
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateNumber(input.number);
    throw e;
  }
}

export async function updateMatter(user: CurrentUser, id: number, patch: MatterPatch): Promise<Matter> {
  try {
    return await getDb().transaction(async (trx) => {
      await trx("matters").where({ id }).forUpdate().first("id");
      const before = await findMatter(trx, id);
      const merged = { ...before, team: before.team.map((p) => p.id), ...patch };
      // Reopening clears the closed date unless one is sent: an open matter has none.
      if (patch.status === "open" && patch.closedOn === undefined) merged.closedOn = null;
      const checked = matterSchema.parse(merged);
      const clientName = checked.clientId === before.clientId ? before.clientName : await requireClient(trx, checked.clientId);
      const team = await requireTeam(trx, checked.team, before.team.map((p) => p.id));
      if (checked.number !== before.number) await refuseDuplicateNumber(trx, checked.number, id);
      const diff = changedFields(snapshot(before), snapshot({ ...checked, clientName }));
      if (Object.keys(diff.after).length) {
        await trx("matters").where({ id }).update({ ...toRow(checked), updated_at: trx.fn.now() });
        await appendSetupEvent(trx, {
          userId: user.id,
          entity: "matter",
          entityId: id,
          action: actionOf(snapshot(before), snapshot({ ...checked, clientName })),
          before: { number: before.number, ...diff.before },
          after: { number: checked.number, ...diff.after },
        });
      }
      await writeTeamChanges(trx, user, { id, number: checked.number }, before.team, team);
      return findMatter(trx, id);
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateNumber(patch.number ?? "");
    throw e;
  }
}

export async function getMatter(id: number): Promise<Matter> {
  return findMatter(getDb(), id);
}
