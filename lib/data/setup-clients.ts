import "server-only";
// Setup of clients: names, aliases, e-mail domains and the last four digits of a tax ID (the
// matter matcher reads them). Every change writes its setup event in the same transaction.
import { getDb } from "@/db";
import { AppError, notFound } from "@/lib/errors";
import { whereMatterVisible } from "@/lib/data/document-access";
import { appendSetupEvent } from "@/lib/data/setup-record";
import { changedFields, isDuplicateKey, parseJson } from "@/lib/data/setup-shared";
import type { CurrentUser } from "@/lib/data/users";
import { clientSchema, type ClientInput, type ClientPatch } from "@/lib/validations/setup";

export interface Client {
  id: number;
  name: string;
  aliases: string[];
  emailDomains: string[];
  taxIdLast4: string | null;
}

export interface ClientWithCounts extends Client {
  /** Matters of this client the asking user may see. */
  matterCount: number;
}

const toClient = (r: Record<string, unknown>): Client => ({
  id: Number(r.id),
  name: String(r.name),
  aliases: parseJson<string[]>(r.aliases, []),
  emailDomains: parseJson<string[]>(r.email_domains, []),
  taxIdLast4: (r.tax_id_last4 as string | null) ?? null,
});

const toRow = (c: Omit<Client, "id">) => ({ name: c.name, aliases: JSON.stringify(c.aliases), email_domains: JSON.stringify(c.emailDomains), tax_id_last4: c.taxIdLast4 });
const snapshot = ({ id: _id, ...rest }: Client) => rest; // eslint-disable-line @typescript-eslint/no-unused-vars

/**
 * The clients this user may know of: for anyone outside a restricted matter's team, a client
 * whose only matters are walled off from them is left out (its name would tell of the matter).
 */
export async function listClients(user: CurrentUser): Promise<ClientWithCounts[]> {
  const db = getDb();
  const visibleCount = whereMatterVisible(db("matters as m").whereRaw("m.client_id = c.id"), user).count("m.id");
  const anyMatter = db("matters as am").whereRaw("am.client_id = c.id").select(db.raw("1"));
  const rows = await db("clients as c")
    .select("c.id", "c.name", "c.aliases", "c.email_domains", "c.tax_id_last4", visibleCount.as("matter_count"))
    .where((w) => w.whereNotExists(anyMatter).orWhereExists(whereMatterVisible(db("matters as m").whereRaw("m.client_id = c.id"), user).select(db.raw("1"))))
    .orderBy("c.name");
  return rows.map((r) => ({ ...toClient(r), matterCount: Number(r.matter_count) }));
}

async function findClient(id: number): Promise<Client> {
  const row = await getDb()("clients").where({ id }).first();
  if (!row) throw notFound("That client");
  return toClient(row);
}

const duplicateName = (name: string) => new AppError(409, "duplicate_name", `A client named "${name}" already exists. Use that client, or choose another name.`);

export async function createClient(user: CurrentUser, input: ClientInput): Promise<Client> {
  try {
    return await getDb().transaction(async (trx) => {
      const other = await trx("clients").where({ name: input.name }).first("name");
      if (other) throw duplicateName(other.name);
      const [id] = await trx("clients").insert(toRow(input));
      const created = { id: Number(id), ...input };
      await appendSetupEvent(trx, { userId: user.id, entity: "client", entityId: created.id, action: "created", after: snapshot(created) });
      return created;
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateName(input.name);
    throw e;
  }
}

export async function updateClient(user: CurrentUser, id: number, patch: ClientPatch): Promise<Client> {
  const before = await findClient(id);
  try {
    return await getDb().transaction(async (trx) => {
      await trx("clients").where({ id }).forUpdate().first("id");
      const checked = clientSchema.parse({ ...before, ...patch });
      if (checked.name !== before.name) {
        const other = await trx("clients").where({ name: checked.name }).whereNot({ id }).first("name");
        if (other) throw duplicateName(other.name);
      }
      const after: Client = { id, ...checked };
      const diff = changedFields(snapshot(before), snapshot(after));
      if (Object.keys(diff.after).length === 0) return before;
      await trx("clients").where({ id }).update({ ...toRow(after), updated_at: trx.fn.now() });
      await appendSetupEvent(trx, { userId: user.id, entity: "client", entityId: id, action: before.name !== after.name ? "renamed" : "changed", before: { name: before.name, ...diff.before }, after: { name: after.name, ...diff.after } });
      return after;
    });
  } catch (e) {
    if (isDuplicateKey(e)) throw duplicateName(patch.name ?? "");
    throw e;
  }
}
