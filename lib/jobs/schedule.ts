// The nightly retraining, at RETRAIN_CRON in OFFICE_TIME_ZONE (default 02:00). Every instance
// schedules it; requestRetrain lets only one run start and the training lock lets one train.
import { Cron } from "croner";
import { env } from "@/lib/env";
import { requestRetrain } from "@/lib/learning/retrain";

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
