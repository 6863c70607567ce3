// The nightly retraining, at RETRAIN_CRON in OFFICE_TIME_ZONE (default 02:00). Every instance
// schedules it; requestRetrain lets only one run start and the training lock lets one train.
// The daily digest likewise: mail_log's dedupe key lets one digest per person per day through.
import { Cron } from "croner";
import { env } from "@/lib/env";
import { requestRetrain } from "@/lib/learning/retrain";
import { queueDailyDigests } from "@/lib/data/notices";

export function scheduleNightlyRetrain(): Cron | null {
  if (!env.retrain.cron) return null;
  return new Cron(env.retrain.cron, { timezone: env.retrain.timeZone, protect: true }, async () => {
    try {
      const r = await requestRetrain("nightly", null);
      console.log(`[retrain] nightly run ${r.status === "queued" ? "queued as" : "skipped: already training"} version #${r.versionId}`);
    } catch (e) {
      console.error("[retrain] nightly run could not start:", e);
    }
  });
}

/** The daily To review digest at DIGEST_HOUR in OFFICE_TIME_ZONE; every instance may run it (one mail per person per day). */
export function scheduleDailyDigest(): Cron {
  return new Cron(`0 ${env.mail.digestHour} * * *`, { timezone: env.retrain.timeZone, protect: true }, async () => {
    try {
      const n = await queueDailyDigests();
      console.log(`[digest] ${n} digest${n === 1 ? "" : "s"} queued`);
    } catch (e) {
      console.error("[digest] could not queue today's digests:", e);
    }
  });
}
