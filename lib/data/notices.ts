import "server-only";
// Notices by e-mail, each one a person can switch off on their profile page: the daily To review
// digest (clerks and partners), the retraining alert (admins) and the receipt of a scan that
// arrived by e-mail (lib/data/mail-intake.ts). The digest counts only what the person may see:
// the queue is read through the ethical wall as that person.
import { getDb } from "@/db";
import { env } from "@/lib/env";
import { queueMail } from "@/lib/data/mail-log";
import { listQueue, type QueueFilters } from "@/lib/data/review";
import type { CurrentUser } from "@/lib/data/users";
import { digestMail, retrainAlertMail } from "@/lib/mail/templates";

export interface NoticeSettings {
  digest: boolean;
  retrainAlerts: boolean;
  scanReceipts: boolean;
}

const COLUMNS = { digest: "notify_digest", retrainAlerts: "notify_retrain", scanReceipts: "notify_scan_receipt" } as const;

export async function getNoticeSettings(user: CurrentUser): Promise<NoticeSettings> {
  const row = await getDb()("users").where({ id: user.id }).first(Object.values(COLUMNS));
  return { digest: Boolean(row.notify_digest), retrainAlerts: Boolean(row.notify_retrain), scanReceipts: Boolean(row.notify_scan_receipt) };
}

export async function setNoticeSettings(user: CurrentUser, change: Partial<NoticeSettings>): Promise<NoticeSettings> {
  const update: Record<string, boolean> = {};
  for (const [key, column] of Object.entries(COLUMNS)) {
    const value = change[key as keyof NoticeSettings];
    if (value !== undefined) update[column] = value;
  }
  if (Object.keys(update).length) await getDb()("users").where({ id: user.id }).update(update);
  return getNoticeSettings(user);
}

const QUEUE: QueueFilters = { list: "review", sort: "age", dir: "asc", page: 1, pageSize: 1 };

/** The digest's figures for one person, or null when nothing waits for them. */
export async function digestFigures(user: CurrentUser) {
  const oldest = await listQueue(user, QUEUE);
  if (oldest.total === 0) return null;
  // minConfidence 0 leaves out documents with no confidence (unreadable ones), which sort first.
  const lowest = await listQueue(user, { ...QUEUE, sort: "confidence", minConfidence: 0 });
  return {
    waiting: oldest.total,
    oldestSince: new Date(oldest.items[0].uploadedAt),
    lowestConfidence: lowest.items[0]?.suggestion?.confidence ?? null,
  };
}

/** The office's calendar day in OFFICE_TIME_ZONE, e.g. 2026-12-02. */
export function officeDay(at = new Date()): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone: env.retrain.timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(at);
}

/**
 * Queues today's digest for every active clerk and partner who wants it and has something
 * waiting. Every app instance may call this: the dedupe key lets one digest per person per day through.
 */
export async function queueDailyDigests(day = officeDay()): Promise<number> {
  const db = getDb();
  const people: CurrentUser[] = await db("users")
    .whereIn("role", ["clerk", "partner"])
    .where({ active: true, notify_digest: true })
    .whereNotNull("password_hash")
    .select("id", "email", "name", "role");
  let queued = 0;
  for (const person of people) {
    const figures = await digestFigures(person);
    if (!figures) continue;
    const id = await queueMail(db, { kind: "digest", userId: person.id, dedupeKey: `digest:${day}:${person.id}`, mail: digestMail(person.email, person.name, figures, `${env.origin}/review`) });
    if (id) queued++;
  }
  return queued;
}

/** Tells the admins who want it that a retraining was rejected or failed, with the reason. */
export async function alertAdminsOfRetrain(versionId: number): Promise<number> {
  const db = getDb();
  const version = await db("model_versions").where({ id: versionId }).first("id", "status", "reason");
  if (!version || !["rejected", "failed"].includes(version.status)) return 0;
  const admins = await db("users").where({ role: "admin", active: true, notify_retrain: true }).whereNotNull("password_hash").select("id", "email");
  let queued = 0;
  for (const admin of admins) {
    const mail = retrainAlertMail(admin.email, versionId, version.status, version.reason ?? "No reason was recorded.", `${env.origin}/models`);
    if (await queueMail(db, { kind: "retrain_alert", userId: admin.id, dedupeKey: `retrain:${versionId}:${admin.id}`, mail })) queued++;
  }
  return queued;
}
