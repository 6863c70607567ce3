import "server-only";
// People (Setup › People, admins): the list, invitations, changes of role and deactivation. A
// change of role or state takes effect on the person's next request, because every request reads
// the role and state from the database (lib/data/users.ts); deactivation also ends their sessions.
// Every change goes on the setup record in the same transaction.
import type { Knex } from "knex";
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/auth/permissions";
import { INVITATION_HOURS, issueToken } from "@/lib/data/account-tokens";
import { queueMail } from "@/lib/data/mail-log";
import { appendSetupEvent } from "@/lib/data/setup-record";
import type { CurrentUser } from "@/lib/data/users";
import { invitationMail } from "@/lib/mail/templates";

export type PersonState = "invited" | "active" | "deactivated";

export interface Person {
  id: number;
  email: string;
  name: string;
  role: Role;
  state: PersonState;
  lastSignInAt: string | null;
  invitedAt: string | null;
  invitationExpiresAt: string | null;
}

function stateOf(row: { active: number | boolean; password_hash: string | null }): PersonState {
  if (!row.active) return "deactivated";
  return row.password_hash ? "active" : "invited";
}

const iso = (d: Date | string | null) => (d ? new Date(d).toISOString() : null);

export async function listPeople(onlyId?: number): Promise<Person[]> {
  const db = getDb();
  const q = db("users as u");
  if (onlyId !== undefined) q.where("u.id", onlyId);
  const rows = await q
    .select("u.id", "u.email", "u.name", "u.role", "u.active", "u.password_hash", "u.last_sign_in_at", "u.invited_at")
    .select(
      db("account_tokens as t")
        .max("t.expires_at")
        .whereRaw("t.user_id = u.id")
        .where("t.purpose", "invitation")
        .whereNull("t.used_at")
        .as("invitation_expires_at"),
    )
    .orderBy("u.name");
  return rows.map((r) => ({
    id: r.id,
    email: r.email,
    name: r.name,
    role: r.role,
    state: stateOf(r),
    lastSignInAt: iso(r.last_sign_in_at),
    invitedAt: iso(r.invited_at),
    invitationExpiresAt: stateOf(r) === "invited" ? iso(r.invitation_expires_at) : null,
  }));
}

async function sendInvitation(trx: Knex.Transaction, admin: CurrentUser, person: { id: number; email: string; name: string }) {
  const token = await issueToken(trx, person.id, "invitation", admin.id);
  const link = `${env.origin}/invite/${token}`;
  await queueMail(trx, { kind: "invitation", userId: person.id, mail: invitationMail(person.email, person.name, admin.name, link, INVITATION_HOURS) });
}

export async function invitePerson(admin: CurrentUser, input: { email: string; name: string; role: Role }): Promise<Person> {
  const id = await getDb().transaction(async (trx) => {
    const existing = await trx("users").where({ email: input.email }).forUpdate().first("id", "password_hash", "active");
    if (existing) {
      const hint = existing.active && !existing.password_hash ? " They have not accepted yet: send the invitation again from their row." : "";
      throw new AppError(409, "already_a_person", `${input.email} already has a Foldwright account.${hint}`);
    }
    const [userId] = await trx("users").insert({ email: input.email, name: input.name, role: input.role, password_hash: null, invited_at: trx.raw("NOW()") });
    await sendInvitation(trx, admin, { id: userId, email: input.email, name: input.name });
    await appendSetupEvent(trx, { userId: admin.id, entity: "user", entityId: userId, action: "invited", after: input });
    return userId as number;
  });
  return findPerson(id);
}

export async function resendInvitation(admin: CurrentUser, id: number): Promise<Person> {
  await getDb().transaction(async (trx) => {
    const row = await trx("users").where({ id }).forUpdate().first("id", "email", "name", "active", "password_hash");
    if (!row) throw new AppError(404, "not_found", "That person was not found. Reload the list of people.");
    if (stateOf(row) !== "invited") {
      throw new AppError(409, "not_invited", `${row.email} is ${stateOf(row)}, not waiting on an invitation. Only a person who has not accepted yet can be invited again.`);
    }
    await sendInvitation(trx, admin, row);
    await appendSetupEvent(trx, { userId: admin.id, entity: "user", entityId: id, action: "invitation_resent", after: { email: row.email } });
  });
  return findPerson(id);
}

export async function findPerson(id: number): Promise<Person> {
  const [person] = await listPeople(id);
  if (!person) throw new AppError(404, "not_found", "That person was not found. Reload the list of people.");
  return person;
}

const LAST_ADMIN = "This is the last active admin. Make another person an admin first, so that someone can still manage Setup.";

/** A change of role and/or active state; the last active admin can be neither demoted nor deactivated. */
export async function changePerson(admin: CurrentUser, id: number, change: { role?: Role; active?: boolean }): Promise<Person> {
  await getDb().transaction(async (trx) => {
    // Lock every admin row first (in id order) so two simultaneous demotions cannot both pass the check.
    const admins: { id: number; active: number; password_hash: string | null }[] = await trx("users")
      .where({ role: "admin" })
      .orderBy("id")
      .forUpdate()
      .select("id", "active", "password_hash");
    const row = await trx("users").where({ id }).forUpdate().first("id", "email", "role", "active", "password_hash");
    if (!row) throw new AppError(404, "not_found", "That person was not found. Reload the list of people.");
    const before = { role: row.role, active: Boolean(row.active) };
    const after = { role: change.role ?? before.role, active: change.active ?? before.active };
    if (after.role === before.role && after.active === before.active) return;
    const isActiveAdmin = before.role === "admin" && before.active && row.password_hash;
    const staysActiveAdmin = after.role === "admin" && after.active;
    if (isActiveAdmin && !staysActiveAdmin) {
      const others = admins.filter((a) => a.id !== id && a.active && a.password_hash).length;
      if (others === 0) throw new AppError(409, "last_admin", LAST_ADMIN);
    }
    const update: Record<string, unknown> = { role: after.role, active: after.active };
    if (before.active && !after.active) update.session_epoch = trx.raw("session_epoch + 1"); // ends every session now
    await trx("users").where({ id }).update(update);
    const action = before.active !== after.active ? (after.active ? "reactivated" : "deactivated") : "role_changed";
    await appendSetupEvent(trx, { userId: admin.id, entity: "user", entityId: id, action, before, after });
  });
  return findPerson(id);
}
