"use client";
import { useState } from "react";
import { formatPercent, formatUtc } from "@/components/document/format";
import { ConfirmDialog } from "./confirm-dialog";
import { requestJson } from "./request";
import { formatF1, type ModelVersion } from "./types";

interface PromoteDialogProps {
  target: ModelVersion | null;
  current: ModelVersion | null;
  autoFileEnabled: boolean;
  onClose: () => void;
  onDone: () => void;
}

function barWords(v: ModelVersion): string {
  if (v.autoFileThreshold === null) return "no auto-file bar (no confidence reached the target precision), so nothing would be auto-filed";
  return `an auto-file bar of ${formatPercent(v.autoFileThreshold, 1)}${v.autoFileShare !== null ? `, passed by ${formatPercent(v.autoFileShare)} of documents` : ""}`;
}

/** Says what changes when a version becomes current, then promotes (or rolls back) on confirmation. */
export function PromoteDialog({ target, current, autoFileEnabled, onClose, onDone }: PromoteDialogProps) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const rollback = current !== null && target !== null && target.id < current.id;
  const close = () => {
    setError(null);
    onClose();
  };
  const confirm = async () => {
    if (!target) return;
    setBusy(true);
    setError(null);
    try {
      await requestJson(`/api/models/${target.id}/promote`, { method: "POST" });
      onDone();
      close();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  return (
    <ConfirmDialog
      open={target !== null}
      title={target ? `${rollback ? "Roll back to" : "Make"} version #${target.id}${rollback ? "" : " current"}?` : ""}
      confirmLabel={target ? `Make #${target.id} current` : "Make current"}
      busy={busy}
      error={error}
      onConfirm={confirm}
      onCancel={close}
    >
      {target && (
        <>
          <p>
            From now on, new suggestions come from version <span className="font-mono">#{target.id}</span> (macro-F1 {formatF1(target.macroF1)}, trained on{" "}
            {target.trainCount ?? "–"} documents{target.finishedAt ? `, ${formatUtc(target.finishedAt).slice(0, 10)}` : ""}).
          </p>
          {current ? (
            <p>
              Version <span className="font-mono">#{current.id}</span> (macro-F1 {formatF1(current.macroF1)}) stops serving and is marked retired; you can make it current again later.
              {rollback && " This is a roll-back to an older version."}
            </p>
          ) : (
            <p>No version is current now; this one starts serving.</p>
          )}
          <p>
            It brings {barWords(target)}.{" "}
            {autoFileEnabled ? "Auto-filing is on, so this bar decides which documents are filed without review." : "Auto-filing is off, so nothing is filed without review."}
          </p>
          <p className="text-ink-soft">Suggestions already made and documents already filed stay as they are. The version list records who made the change.</p>
        </>
      )}
    </ConfirmDialog>
  );
}
