"use client";
import { useEffect, useState } from "react";
import { formatDuration, formatUtc } from "@/components/document/format";
import { triggerWords, type ModelVersion } from "./types";

/** A version in training: its step in words, the time since it was asked for, and a moving bar. */
export function TrainingProgress({ version: v }: { version: ModelVersion }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, []);
  const elapsed = Math.max(0, now - Date.parse(v.createdAt));
  return (
    <section aria-label="Retraining in progress" className="rounded border border-verdigris/40 bg-verdigris-light/40 p-4" data-testid="training-progress">
      <p className="text-sm">
        <span className="font-medium">Training model version <span className="font-mono">#{v.id}</span></span>
        <span className="text-ink-soft">
          {" "}· {triggerWords(v)} · started <span className="font-mono">{formatUtc(v.createdAt, true)}</span> UTC
        </span>
      </p>
      <p className="mt-1 text-sm" role="status" aria-live="polite" data-testid="training-step">
        {v.progress ?? "Working"}…{" "}
        <span className="font-mono text-xs text-ink-soft" suppressHydrationWarning>
          {formatDuration(elapsed)} so far
        </span>
      </p>
      <div className="mt-2 h-1 w-full overflow-hidden rounded-full bg-paper-deep" role="progressbar" aria-label={`Training version #${v.id}`} aria-valuetext={v.progress ?? "Working"}>
        <div className="h-1 w-1/3 animate-pulse rounded-full bg-verdigris" />
      </div>
      <p className="mt-2 text-xs text-ink-soft">
        The current model keeps making suggestions meanwhile. The new version replaces it only if its macro-F1 is not more than one point lower on the same folds.
      </p>
    </section>
  );
}
