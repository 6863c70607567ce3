"use client";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import useSWR from "swr";
import { Notice } from "@/components/ui/notice";
import { AutoFilePolicy } from "./auto-file-policy";
import { CurrentVersion } from "./current-version";
import { NoModelYet } from "./empty-state";
import { PromoteDialog } from "./promote-dialog";
import { requestJson } from "./request";
import { RetrainButton } from "./retrain-button";
import { TrainingProgress } from "./training-progress";
import { STATUS_WORDS, type ModelVersion, type ModelsOverview } from "./types";
import { VersionsTable } from "./versions-table";

interface ModelsBoardProps {
  initial: ModelsOverview;
  canManage: boolean;
  /** Server-rendered per-class metrics of the current version. */
  children?: React.ReactNode;
}

const POLL_TRAINING_MS = 1500;
const POLL_IDLE_MS = 30_000; // a nightly run or another admin may start one meanwhile

/**
 * The Models screen's live part: follows GET /api/models (every 1.5 s while a version trains),
 * retrains, promotes or rolls back, and edits the auto-file policy.
 */
export function ModelsBoard({ initial, canManage, children }: ModelsBoardProps) {
  const router = useRouter();
  const followed = useRef<number | null>(initial.training?.id ?? null);
  const [finished, setFinished] = useState<ModelVersion | null>(null);
  const [promoting, setPromoting] = useState<ModelVersion | null>(null);
  const { data, error, mutate } = useSWR<ModelsOverview>("/api/models", (url: string) => requestJson<ModelsOverview>(url), {
    fallbackData: initial,
    refreshInterval: (d) => (d?.training ? POLL_TRAINING_MS : POLL_IDLE_MS),
    onSuccess: (d) => {
      const was = followed.current;
      followed.current = d.training?.id ?? null;
      if (was !== null && d.training?.id !== was) {
        setFinished(d.versions.find((v) => v.id === was) ?? null);
        router.refresh(); // the per-class metrics are rendered on the server
      }
    },
  });
  const overview = data ?? initial;
  const current = overview.versions.find((v) => v.id === overview.current) ?? null;
  const afterChange = () => {
    void mutate();
    router.refresh();
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start gap-4">
        <p className="max-w-3xl flex-1 text-sm text-ink-soft">
          Each run trains a new model version on human-confirmed filings, scores it by cross-validation and makes it current only if its macro-F1 is not more
          than one point below the current one on the same folds. Runs happen every night{canManage ? " and whenever you press Retrain now" : ""}.
        </p>
        {canManage && <RetrainButton training={overview.training !== null} onStarted={() => void mutate()} />}
      </div>

      {error && <Notice tone="error" title="Could not refresh the model versions">{(error as Error).message} The figures below may be out of date.</Notice>}
      {overview.training && <TrainingProgress version={overview.training} />}
      {finished && !overview.training && (
        <Notice tone={finished.status === "current" ? "info" : finished.status === "failed" ? "error" : "warning"} title={`Version #${finished.id}: ${STATUS_WORDS[finished.status].toLowerCase()}`}>
          {finished.reason ?? "The run has ended."}
        </Notice>
      )}

      {current ? (
        <CurrentVersion version={current} />
      ) : overview.versions.some((v) => v.status !== "training") ? (
        <Notice tone="warning" title="No version is current">
          Suggestions are ranked by the cabinet types&apos; descriptions until a version is made current.{canManage ? " Make a finished version current below, or retrain." : ""}
        </Notice>
      ) : (
        !overview.training && <NoModelYet minExamples={overview.settings.minExamplesPerType} canManage={canManage} />
      )}

      {current && children}

      <AutoFilePolicy
        settings={overview.settings}
        current={current}
        canManage={canManage}
        onSaved={(settings) => void mutate({ ...overview, settings })}
      />

      {overview.versions.length > 0 && <VersionsTable versions={overview.versions} canManage={canManage} onMakeCurrent={setPromoting} />}

      {canManage && (
        <PromoteDialog target={promoting} current={current} autoFileEnabled={overview.settings.autoFileEnabled} onClose={() => setPromoting(null)} onDone={afterChange} />
      )}
    </div>
  );
}
