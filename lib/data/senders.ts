import "server-only";
// Allowed senders of scans by e-mail (Setup › Allowed senders): addresses or whole domains, each
// filed as a named person. Who a sender maps to: a sender whose address is a person's is that
// person (refused when deactivated or when their role may not upload); any other allowed sender's documents are recorded as
// uploaded by the entry's person (e.g. the clerk who looks after the copier), through e-mail, with
// the sender's address on the message record and in the receipt.
import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { can, type Role } from "@/lib/auth/permissions";
import { appendSetupEvent } from "@/lib/data/setup-record";
import type { CurrentUser } from "@/lib/data/users";

export interface AllowedSender {
  id: number;
  pattern: string;
  kind: "address" | "domain";
  filesAs: { id: number; name: string; email: string };
  note: string | null;
  createdAt: string;
}

export async function listSenders(): Promise<AllowedSender[]> {
  const rows = await getDb()("allowed_senders as s")
    .join("users as u", "u.id", "s.files_as_user_id")
    .orderBy("s.pattern")
    .select("s.id", "s.pattern", "s.kind", "s.note", "s.created_at", "u.id as user_id", "u.name", "u.email");
  return rows.map((r) => ({ id: r.id, pattern: r.pattern, kind: r.kind, note: r.note, createdAt: new Date(r.created_at).toISOString(), filesAs: { id: r.user_id, name: r.name, email: r.email } }));
}

async function uploaderById(id: number): Promise<CurrentUser | null> {
  const row = await getDb()("users").where({ id, active: true }).whereNotNull("password_hash").first("id", "email", "name", "role");
  return row && can(row.role as Role, "documents.upload") ? row : null;
}

export async function addSender(admin: CurrentUser, input: { pattern: string; filesAsUserId: number; note?: string }): Promise<AllowedSender> {
  if (!(await uploaderById(input.filesAsUserId))) {
    throw new AppError(422, "bad_input", "Scans must be filed as an active person whose role may upload (a clerk or an admin). Choose another person.");
  }
  const kind = input.pattern.includes("@") ? "address" : "domain";
  const id = await getDb().transaction(async (trx) => {
    if (await trx("allowed_senders").where({ pattern: input.pattern }).first("id")) {
      throw new AppError(409, "already_allowed", `${input.pattern} is already an allowed sender.`);
    }
    const [newId] = await trx("allowed_senders").insert({ pattern: input.pattern, kind, files_as_user_id: input.filesAsUserId, note: input.note || null, created_by: admin.id });
    await appendSetupEvent(trx, { userId: admin.id, entity: "sender", entityId: newId, action: "created", after: { pattern: input.pattern, kind, filesAsUserId: input.filesAsUserId, note: input.note ?? null } });
    return newId as number;
  });
  return (await listSenders()).find((s) => s.id === id)!;
}

export async function removeSender(admin: CurrentUser, id: number): Promise<void> {
  await getDb().transaction(async (trx) => {
    const row = await trx("allowed_senders").where({ id }).forUpdate().first();
    if (!row) throw new AppError(404, "not_found", "That allowed sender was not found. Reload the list.");
    await trx("allowed_senders").where({ id }).delete();
    await appendSetupEvent(trx, { userId: admin.id, entity: "sender", entityId: id, action: "removed", before: { pattern: row.pattern, kind: row.kind, filesAsUserId: row.files_as_user_id, note: row.note } });
  });
}

export type SenderDecision = { ok: true; uploader: CurrentUser; entry: string } | { ok: false; message: string };

/** Whether mail from this address may bring scans, and as whom they are uploaded. */
export async function decideSender(addressInput: string): Promise<SenderDecision> {
  const address = addressInput.trim().toLowerCase();
  const domain = address.split("@")[1] ?? "";
  const entries = await getDb()("allowed_senders").whereIn("pattern", [address, domain]).select("pattern", "kind", "files_as_user_id");
  const entry = entries.find((e) => e.kind === "address") ?? entries[0];
  if (!entry || !domain) {
    return { ok: false, message: `${address || "This sender"} may not send scans to this office. Ask its Foldwright admin to add the address or domain under Setup, Allowed senders.` };
  }
  const self = await getDb()("users").where({ email: address }).first("id");
  if (self) {
    // A person's own address speaks for that person: deactivated, or a role that may not upload, is refused.
    const person = await uploaderById(self.id);
    if (person) return { ok: true, uploader: person, entry: entry.pattern };
    return { ok: false, message: `The Foldwright account of ${address} is not active or its role may not upload documents, so its scans are not taken. Ask the office's Foldwright admin.` };
  }
  const uploader = await uploaderById(entry.files_as_user_id);
  if (!uploader) {
    return { ok: false, message: `Scans from ${address} are filed as a person who can no longer upload. Ask the office's Foldwright admin to update the allowed sender ${entry.pattern}.` };
  }
  return { ok: true, uploader, entry: entry.pattern };
}
