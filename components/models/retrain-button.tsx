"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { requestJson } from "./request";

interface RetrainButtonProps {
  training: boolean;
  /** Called after the request was taken, so the screen starts following the new version. */
  onStarted: () => void;
}

/** Asks for a new model version now; a run already under way answers 409 with a sentence. */
export function RetrainButton({ training, onStarted }: RetrainButtonProps) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const retrain = async () => {
    setBusy(true);
    setError(null);
    try {
      await requestJson<{ versionId: number }>("/api/models/retrain", { method: "POST" });
      onStarted();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="flex flex-col items-end gap-1">
      <Button onClick={retrain} disabled={busy || training} data-testid="retrain">
        {training ? "Retraining…" : busy ? "Asking…" : "Retrain now"}
      </Button>
      {error && (
        <p role="alert" className="max-w-sm text-right text-xs text-brick" data-testid="retrain-error">
          {error}
        </p>
      )}
    </div>
  );
}
