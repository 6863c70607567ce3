import "server-only";
// Cabinet types and matters as the screens and the suggester need them.
import { getDb } from "@/db";
import { can } from "@/lib/auth/permissions";
import { notAllowed } from "@/lib/errors";
import { whereMatterVisible } from "@/lib/data/document-access";
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

/** Cabinet types hold no matter or document, so every signed-in role may read them. */
export async function listCabinetTypes(user: CurrentUser, activeOnly = false): Promise<CabinetTypeOption[]> {
  if (!can(user.role, "documents.read")) throw notAllowed("see cabinet types");
  const q = getDb()("cabinet_types").select("id", "name", "description", "keywords", "active").orderBy("name");
  if (activeOnly) q.where({ active: true });
  return (await q).map((r) => ({ ...r, keywords: json<string[]>(r.keywords, []), active: Boolean(r.active) }));
}

interface MatterRow {
  id: number;
  number: string;
  title: string;
  status: MatterOption["status"];
  restricted: number;
  clientName: string;
  aliases: unknown;
  email_domains: unknown;
  tax_id_last4: string | null;
}

/** The matters this user may see (restricted ones only with their team, or as admin). */
export async function listVisibleMatters(user: CurrentUser): Promise<MatterOption[]> {
  const q = getDb()("matters as m")
    .join("clients as c", "c.id", "m.client_id")
    .select("m.id", "m.number", "m.title", "m.status", "m.restricted", "c.name as clientName", "c.aliases", "c.email_domains", "c.tax_id_last4")
    .orderBy("m.number");
  const rows: MatterRow[] = await whereMatterVisible(q, user);
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

export async function canSeeMatter(user: CurrentUser, matterId: number): Promise<boolean> {
  return Boolean(await whereMatterVisible(getDb()("matters as m").where("m.id", matterId), user).first("m.id"));
}
