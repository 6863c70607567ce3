// The end of an archive import: once its last file has settled, a retraining starts, attributed
// to the admin who confirmed the import, so the model learns the imported filings at once.
import { finishImportIfSettled, recordImportRetrain } from "@/lib/data/import-settle";
import { requestRetrain } from "@/lib/learning/retrain";

export async function finishImport(importId: number): Promise<void> {
  const finished = await finishImportIfSettled(importId);
  if (!finished || finished.filed === 0) return;
  // "busy": a run under way already; the import's filings are in the next one (the nightly at the latest).
  const request = await requestRetrain("manual", finished.confirmedBy);
  await recordImportRetrain(importId, request.versionId);
}
