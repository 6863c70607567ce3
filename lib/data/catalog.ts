import "server-only";
// Cabinet types and matters as the screens and the suggester need them.
import { getDb } from "@/db";
import type { CurrentUser } from "@/lib/data/users";
import type { MatterRecord } from "@/lib/filing/match-matter";

export interface CabinetTypeOption {
  id: number;
  name: string;
  description: string;
  keywords: string[];
  active: boolean;
}

/** A matter with what the matter matcher reads, and whether it is behind an ethical wall. */
export interface MatterOption extends MatterRecord {
  restricted: boolean;
}

const json = <T>(v: unknown, fallback: T): T => (v === null || v === undefined ? fallback : typeof v === "string" ? (JSON.parse(v) as T) : (v as T));

export async function listCabinetTypes(activeOnly = false): Promise<CabinetTypeOption[]> {
  const q = getDb()("cabinet_types").select("id", "name", "description", "keywords", "active").orderBy("name");
  if (activeOnly) q.where({ active: true });
  return (await q).map((r) => ({ ...r, keywords: json<string[]>(r.keywords, []), active: Boolean(r.active) }));
}

/** Every matter, for the suggester (which never shows them to anyone by itself). */
export async function listAllMatters(): Promise<MatterOption[]> {
  const rows = await getDb()("matters as m")
    .join("clients as c", "c.id", "m.client_id")
    .select("m.id", "m.number", "m.title", "m.status", "m.restricted", "c.name as clientName", "c.aliases", "c.email_domains", "c.tax_id_last4");
  return rows.map((r) => ({
    id: r.id,
    number: r.number,
    title: r.title,
    clientName: r.clientName,
    aliases: json<string[]>(r.aliases, []),
    emailDomains: json<string[]>(r.email_domains, []),
    taxIdLast4: r.tax_id_last4,
    status: r.status,
    restricted: Boolean(r.restricted),
  }));
}

/** The matters this user may see (restricted ones only with their team, or as admin). */
export async function listVisibleMatters(user: CurrentUser): Promise<MatterOption[]> {
  const all = await listAllMatters();
  if (user.role === "admin") return all;
  const mine = new Set((await getDb()("matter_members").where({ user_id: user.id }).pluck("matter_id")) as number[]);
  return all.filter((m) => !m.restricted || mine.has(m.id));
}

export async function canSeeMatter(user: CurrentUser, matterId: number): Promise<boolean> {
  return (await listVisibleMatters(user)).some((m) => m.id === matterId);
}
