// Retraining: one model version per run. Holds the MariaDB named lock `foldwright_retrain` so
// only one server trains at a time; trains on human-confirmed filings; cross-validates; stores
// the artifact in the bucket; promotes the candidate only if its macro-F1 is not more than one
// point below the current model's settings on the same folds. A failed run leaves the current
// model serving (promotion is the only step that changes which version is current).
import { alertAdminsOfRetrain } from "@/lib/data/notices";
import { withNamedLock } from "@/lib/data/locks";
import {
  createTrainingVersion,
  failAbandonedTrainingRuns,
  findCurrentModelParams,
  findTrainingVersion,
  finishTrainingRun,
  LeaseLostError,
  updateModelVersion,
  type CompleteInTransaction,
  type TrainingOutcome,
} from "@/lib/data/models";
import { getOfficeSettings } from "@/lib/data/settings";
import { FOLDWRIGHT } from "@/lib/data/users";
import { loadTrainingCounts, loadTypePriors } from "@/lib/data/training-set";
import { resolveOptions, saveModel, trainOnCounts, type TrainOptionsInput } from "@/lib/ml";
import { putObject } from "@/storage/s3";
import { chooseFolds, describeEvaluation, scoreOnFolds } from "@/lib/learning/evaluate-candidate";
import { TRAIN_JOB } from "@/lib/jobs/kinds";

export const PROMOTION_MARGIN = 0.01; // "not more than one point lower" (DESIGN §5)
/** Training settings of new versions: lib/ml's C; one thread keeps a web server's other core free. */
export const DEFAULT_PARAMS: TrainOptionsInput = { C: resolveOptions().C, threads: 1 };

export type RetrainRequest = { status: "queued"; versionId: number } | { status: "busy"; versionId: number };

/** Trains a version here and now (the start command's first model); returns its id. */
export async function trainNow(trigger: "start" | "manual"): Promise<number> {
  const versionId = await createTrainingVersion(trigger, null);
  await runTraining(versionId);
  return versionId;
}

/** Creates a version in "training" and queues its job, unless a run is already under way. */
export async function requestRetrain(trigger: "nightly" | "manual" | "start", userId: number | null): Promise<RetrainRequest> {
  const result = await withNamedLock("foldwright_retrain_request", 10, async () => {
    await failAbandonedTrainingRuns(TRAIN_JOB);
    const busy = await findTrainingVersion();
    if (busy) return { status: "busy" as const, versionId: busy };
    return { status: "queued" as const, versionId: await createTrainingVersion(trigger, userId, TRAIN_JOB) };
  });
  if (!result) throw new Error("Could not take the retraining request lock within 10 s.");
  return result;
}

export interface TrainingHooks {
  /** Tests only: changes the labels the candidate learns from (e.g. shuffles them). */
  transformLabels?: (labels: string[]) => string[];
}

/** Matrix rows whose label has at least `minExamples` rows. */
function eligibleRows(labels: string[], minExamples: number): number[] {
  const counts = new Map<string, number>();
  for (const l of labels) counts.set(l, (counts.get(l) ?? 0) + 1);
  return labels.flatMap((l, r) => (counts.get(l)! >= minExamples ? [r] : []));
}

/**
 * Runs one version's training; returns false when another server holds the training lock.
 * `completeJob` (a queued run's) is called inside the transaction that writes the results.
 */
export async function runTraining(versionId: number, hooks: TrainingHooks = {}, completeJob?: CompleteInTransaction): Promise<boolean> {
  const ran = await withNamedLock("foldwright_retrain", 0, async () => {
    const started = Date.now();
    const progress = (text: string) => updateModelVersion(versionId, { progress: text });
    try {
      await progress("Gathering human-filed documents");
      const settings = await getOfficeSettings(FOLDWRIGHT);
      // Stored term counts, streamed: no text is loaded or tokenised (lib/data/training-set.ts).
      const set = await loadTrainingCounts();
      const rows = eligibleRows(set.labels, settings.minExamplesPerType);
      const truth = set.labels;
      const labels = hooks.transformLabels ? hooks.transformLabels(rows.map((r) => truth[r])) : rows.map((r) => truth[r]);
      // labelOf: the candidate's label of each matrix row (only the eligible rows are read).
      const labelOf = [...truth];
      rows.forEach((r, i) => (labelOf[r] = labels[i]));
      const classes = [...new Set(labels)];
      if (classes.length < 2) {
        throw new Error(`Too few filed documents to train: at least two cabinet types need ${settings.minExamplesPerType} human-filed documents each (found ${classes.length}).`);
      }
      const folds = chooseFolds(labels);
      await progress(`Evaluating by ${describeEvaluation(rows.length, folds)}`);
      // The types' own names, descriptions and keywords: prior knowledge beside the examples.
      const priors = await loadTypePriors();
      const report = await scoreOnFolds(set.matrix, rows, labelOf, folds, { ...DEFAULT_PARAMS, priors }, settings.autoFileTarget);

      const current = await findCurrentModelParams();
      let compared: number | null = null;
      if (current) {
        const sameSettings = JSON.stringify(current.params) === JSON.stringify(DEFAULT_PARAMS) && !hooks.transformLabels;
        if (sameSettings) compared = report.macroF1;
        else {
          await progress("Scoring the current model's settings on the same folds");
          compared = (await scoreOnFolds(set.matrix, rows, truth, folds, { ...(current.params as TrainOptionsInput), priors }, settings.autoFileTarget)).macroF1;
        }
      }

      await progress("Training on all documents");
      const model = await trainOnCounts(set.matrix, rows, labels, { ...DEFAULT_PARAMS, priors });
      model.metrics = report;
      const bytes = saveModel(model);
      const key = `models/version-${versionId}-${Date.now()}.bin`;
      await progress("Storing the model");
      await putObject(key, Buffer.from(bytes), { contentType: "application/octet-stream", metadata: { "model-version": String(versionId) } });

      const counts: Record<string, number> = {};
      for (const l of labels) counts[l] = (counts[l] ?? 0) + 1;
      const fields = {
        params: JSON.stringify(DEFAULT_PARAMS),
        class_list: JSON.stringify(model.classes.map(Number)),
        class_counts: JSON.stringify(counts),
        vocabulary_size: model.terms.length,
        train_count: rows.length,
        metrics: JSON.stringify(report),
        macro_f1: report.macroF1,
        accuracy: report.accuracy,
        compared_macro_f1: compared,
        autofile_threshold: report.autoFile.threshold,
        autofile_share: report.autoFile.share,
        autofile_target: settings.autoFileTarget,
        artifact_key: key,
        artifact_bytes: bytes.byteLength,
        duration_ms: Date.now() - started,
        finished_at: new Date(),
        progress: null,
      };
      const outcome: TrainingOutcome =
        compared === null
          ? { promote: "The first model: nothing to compare with." }
          : report.macroF1 >= compared - PROMOTION_MARGIN
            ? { promote: `Promoted: macro-F1 ${report.macroF1.toFixed(3)} against ${compared.toFixed(3)} for the current model's settings on the same folds.` }
            : { reject: `Not promoted: macro-F1 ${report.macroF1.toFixed(3)} is more than one point below ${compared.toFixed(3)} for the current model on the same folds. The current model keeps serving.` };
      await finishTrainingRun(versionId, fields, outcome, completeJob);
      if ("reject" in outcome) await alertAdminsOfRetrain(versionId).catch((err) => console.error("[retrain] could not queue the admins' alert:", err));
    } catch (e) {
      if (e instanceof LeaseLostError) throw e; // another worker owns the run now: write nothing
      const fields = { finished_at: new Date(), duration_ms: Date.now() - started };
      const fail = `Training failed: ${e instanceof Error ? e.message : String(e)} The current model keeps serving.`;
      await finishTrainingRun(versionId, fields, { fail }, completeJob);
      await alertAdminsOfRetrain(versionId).catch((err) => console.error("[retrain] could not queue the admins' alert:", err));
    }
    return true;
  });
  return ran === true;
}
