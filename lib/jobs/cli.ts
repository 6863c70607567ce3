// `npm run worker`: a process that only runs background jobs (reading, later suggesting and
// training), for offices that keep heavy work off the web servers. Any number may run.
import { closeDb } from "@/db";
import { shutdownOcr } from "@/lib/intake";
import { startBackgroundWork, stopBackgroundWork } from "@/lib/jobs/start";

const workers = startBackgroundWork();
if (!workers) {
  console.error("JOBS_ENABLED is off: this worker has nothing to do.");
  process.exit(2);
}
console.log(`[jobs] workers ${workers.documents.workerId} (documents) and ${workers.training.workerId} (training) started`);
const stop = async () => {
  await stopBackgroundWork();
  await shutdownOcr();
  await closeDb();
  process.exit(0);
};
process.on("SIGINT", () => void stop());
process.on("SIGTERM", () => void stop());
