import { formatDuration, formatPercent, formatUtc } from "@/components/document/format";
import { formatF1, triggerWords, type ModelVersion } from "./types";

function Figure({ label, value, note }: { label: string; value: React.ReactNode; note?: React.ReactNode }) {
  return (
    <div>
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="font-mono text-lg tabular-nums">{value}</dd>
      {note && <dd className="text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}

/** The version that makes today's suggestions, with its cross-validated figures. */
export function CurrentVersion({ version: v }: { version: ModelVersion }) {
  return (
    <section aria-labelledby="current-heading" className="rounded border border-paper-edge bg-white/70 p-4" data-testid="current-version">
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h2 id="current-heading" className="font-serif text-lg">
          Current: model version <span className="font-mono">#{v.id}</span>
        </h2>
        <p className="text-xs text-ink-soft">
          Trained {v.finishedAt ? <span className="font-mono">{formatUtc(v.finishedAt)}</span> : "–"} UTC ({triggerWords(v)}), took{" "}
          {v.durationMs !== null ? formatDuration(v.durationMs) : "–"}
          {v.promotedAt && (
            <>
              {" "}· current since <span className="font-mono">{formatUtc(v.promotedAt)}</span> UTC
            </>
          )}
        </p>
      </div>
      <dl className="mt-3 grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 lg:grid-cols-6">
        <Figure label="Macro-F1" value={formatF1(v.macroF1)} note="cross-validated" />
        <Figure label="Accuracy" value={v.accuracy !== null ? formatPercent(v.accuracy, 1) : "–"} />
        <Figure label="Documents" value={v.trainCount?.toLocaleString("en-US") ?? "–"} note="human-filed" />
        <Figure label="Cabinet types" value={v.classCount ?? "–"} />
        <Figure label="Vocabulary" value={v.vocabularySize?.toLocaleString("en-US") ?? "–"} note="terms" />
        <Figure
          label="Auto-file bar"
          value={v.autoFileThreshold !== null ? formatPercent(v.autoFileThreshold, 1) : "none"}
          note={
            v.autoFileThreshold !== null && v.autoFileShare !== null
              ? `${formatPercent(v.autoFileShare)} of documents pass it`
              : `no confidence reaches ${v.autoFileTarget !== null ? formatPercent(v.autoFileTarget, 1) : "the target"} precision`
          }
        />
      </dl>
      {v.reason && <p className="mt-3 text-xs text-ink-soft">{v.reason}</p>}
    </section>
  );
}
