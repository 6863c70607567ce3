"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatPercent } from "@/components/document/format";
import { cn } from "@/lib/utils";
import { requestJson } from "./request";
import type { ModelVersion, OfficeSettings } from "./types";

interface AutoFilePolicyProps {
  settings: OfficeSettings;
  current: ModelVersion | null;
  canManage: boolean;
  onSaved: (settings: OfficeSettings) => void;
}

export const AUTO_FILE_CAUTION =
  "Auto-filing files documents without a person looking. Every auto-filed document waits in the spot-check list until someone confirms it; only confirmed filings teach the model. A person remains responsible for filing privileged or sensitive documents.";

const FIELD = "w-24 rounded border border-paper-edge bg-white px-2 py-1 text-sm font-mono disabled:bg-paper-deep/50";

/** The office's auto-file policy: admins change it, auditors read it. */
export function AutoFilePolicy({ settings, current, canManage, onSaved }: AutoFilePolicyProps) {
  // Unsaved edits; null shows the saved policy (which may change under us when the screen refreshes).
  const [draft, setDraft] = useState<{ enabled?: boolean; target?: string; minExamples?: string } | null>(null);
  const enabled = draft?.enabled ?? settings.autoFileEnabled;
  const target = draft?.target ?? String(+(settings.autoFileTarget * 100).toFixed(2));
  const minExamples = draft?.minExamples ?? String(settings.minExamplesPerType);
  const edit = (patch: NonNullable<typeof draft>) => {
    setDraft((d) => ({ ...d, ...patch }));
    setState((s) => ({ ...s, saved: false }));
  };
  const [state, setState] = useState<{ busy: boolean; error: string | null; saved: boolean }>({ busy: false, error: null, saved: false });
  const dirty = enabled !== settings.autoFileEnabled || Number(target) / 100 !== settings.autoFileTarget || Number(minExamples) !== settings.minExamplesPerType;

  const save = async (e: React.FormEvent) => {
    e.preventDefault();
    setState({ busy: true, error: null, saved: false });
    try {
      const body = { autoFileEnabled: enabled, autoFileTarget: Number(target) / 100, minExamplesPerType: Number(minExamples) };
      const res = await requestJson<{ settings: OfficeSettings }>("/api/settings", { method: "PATCH", body: JSON.stringify(body) });
      onSaved(res.settings);
      setDraft(null);
      setState({ busy: false, error: null, saved: true });
    } catch (err) {
      setState({ busy: false, error: (err as Error).message, saved: false });
    }
  };
  const staleBar = current?.autoFileTarget != null && Math.abs(current.autoFileTarget - settings.autoFileTarget) > 1e-6;

  return (
    <section aria-labelledby="policy-heading" className="rounded border border-paper-edge bg-white/70 p-4" data-testid="auto-file-policy">
      <h2 id="policy-heading" className="font-serif text-lg">Auto-file policy</h2>
      <p className="mt-1 rounded border-l-4 border-amber bg-amber-light/50 px-3 py-2 text-sm" data-testid="auto-file-caution">
        {AUTO_FILE_CAUTION}
      </p>
      <form onSubmit={save} className="mt-3 space-y-3">
        <div className="flex items-center gap-3">
          <button
            type="button"
            role="switch"
            aria-checked={enabled}
            aria-labelledby="auto-file-label"
            disabled={!canManage}
            onClick={() => edit({ enabled: !enabled })}
            className={cn("relative h-6 w-11 shrink-0 rounded-full border transition-colors disabled:cursor-not-allowed", enabled ? "border-verdigris bg-verdigris" : "border-paper-edge bg-paper-deep")}
            data-testid="auto-file-switch"
          >
            <span className={cn("absolute top-0.5 h-4.5 w-4.5 rounded-full bg-white shadow transition-all", enabled ? "left-5.5" : "left-0.5")} />
          </button>
          <span id="auto-file-label" className="text-sm">
            Auto-file documents whose confidence passes the bar: <span className="font-medium">{enabled ? "on" : "off"}</span>
          </span>
        </div>
        <div className="flex flex-wrap gap-6">
          <label className="flex flex-col gap-0.5 text-xs text-ink-soft">
            Target precision (%)
            <input type="number" min={50} max={99.99} step={0.1} value={target} onChange={(e) => edit({ target: e.target.value })} disabled={!canManage} className={FIELD} data-testid="auto-file-target" />
          </label>
          <label className="flex flex-col gap-0.5 text-xs text-ink-soft">
            Filed examples before the model learns a cabinet type
            <input type="number" min={2} max={1000} step={1} value={minExamples} onChange={(e) => edit({ minExamples: e.target.value })} disabled={!canManage} className={FIELD} />
          </label>
        </div>
        <p className="text-xs text-ink-soft">
          {current
            ? current.autoFileThreshold !== null
              ? `With version #${current.id}, documents whose confidence is ${formatPercent(current.autoFileThreshold, 1)} or more would be auto-filed: ${formatPercent(current.autoFileShare ?? 0)} of documents in cross-validation, at ${formatPercent(current.autoFileTarget ?? settings.autoFileTarget, 1)} precision.`
              : `Version #${current.id} reaches ${formatPercent(current.autoFileTarget ?? settings.autoFileTarget, 1)} precision at no confidence, so nothing would be auto-filed until a version does.`
            : "There is no model yet, so nothing can be auto-filed."}
          {" "}The bar is worked out when a version trains, so a new target applies from the next version{canManage ? " (press Retrain now to apply it sooner)" : ""}.
          {staleBar && " The current version was trained for a different target."}
        </p>
        {canManage ? (
          <div className="flex items-center gap-3">
            <Button type="submit" disabled={state.busy || !dirty} data-testid="save-policy">
              {state.busy ? "Saving…" : "Save policy"}
            </Button>
            {state.saved && <span role="status" className="text-xs text-verdigris-dark">Saved.</span>}
            {dirty && !state.busy && <span className="text-xs text-ink-soft">Not saved yet.</span>}
          </div>
        ) : (
          <p className="text-xs text-ink-faint">Only an admin can change this policy.</p>
        )}
        {state.error && (
          <p role="alert" className="text-sm text-brick" data-testid="policy-error">
            {state.error}
          </p>
        )}
      </form>
    </section>
  );
}
