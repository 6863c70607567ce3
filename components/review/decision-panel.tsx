"use client";
import { forwardRef, useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Confidence } from "@/components/ui/confidence";
import { Notice } from "@/components/ui/notice";
import { CabinetPicker } from "./cabinet-picker";
import { TextPreview } from "./text-preview";
import { getJson, type FilingPayload } from "./api";
import type { DocumentView, MatterOption, Option, QueueItem } from "./types";

interface PanelProps {
  item: QueueItem;
  list: "review" | "spot-check";
  types: Option[];
  matters: MatterOption[];
  onDecide: (item: QueueItem, payload: FilingPayload) => void;
}

const METHOD_WORDS: Record<string, string> = {
  model: "from the current model",
  blended: "from the model; types with few examples ranked by their descriptions",
  cold_start: "ranked by the cabinet types' descriptions and keywords: no model yet",
};

/** The right panel: the document, the suggestion and the decision controls. */
export const DecisionPanel = forwardRef<HTMLInputElement, PanelProps>(function DecisionPanel({ item, list, types, matters, onDecide }, pickerRef) {
  const { data, error } = useSWR<DocumentView>(`/api/documents/${item.id}`, getJson);
  const suggestion = data?.suggestion ?? null;
  // null until the person picks: then the filed or suggested matter is the default.
  const [picked, setPicked] = useState<number | "" | null>(null);
  const matterId = picked ?? item.filedIn?.matterId ?? suggestion?.matterId ?? item.suggestion?.matterId ?? "";

  const chosenMatter = matterId === "" ? undefined : matterId;
  const canAccept = list === "review" && Boolean(item.suggestion?.cabinetTypeId);
  const decide = (payload: FilingPayload) => onDecide(item, { ...payload, matterId: payload.matterId ?? chosenMatter });
  const refile = (cabinetTypeId: number) => decide({ action: list === "spot-check" ? "move" : canAccept ? "refile" : "file", cabinetTypeId });
  const candidateIds = new Set(suggestion?.matterCandidates.map((c) => c.matterId));

  return (
    <div className="space-y-4" data-testid="decision-panel">
      <div>
        <h2 className="font-serif text-lg leading-tight">{item.name}</h2>
        <p className="text-xs text-ink-soft">
          #{item.id} · {item.pageCount ?? "?"} page{item.pageCount === 1 ? "" : "s"}
          {item.ocrUsed ? " · read by OCR" : ""} ·{" "}
          <a className="text-verdigris hover:underline" href={`/documents/${item.id}`}>
            details and history
          </a>{" "}
          ·{" "}
          <a className="text-verdigris hover:underline" href={`/api/documents/${item.id}/original`}>
            original
          </a>
        </p>
      </div>

      {item.status === "unreadable" && (
        <Notice tone="warning" title="Unreadable">
          {item.reason} Pick the cabinet type and the matter below to file it by hand.
        </Notice>
      )}
      {list === "spot-check" && item.filedIn && (
        <Notice tone="info" title="Auto-filed">
          Filed in {item.filedIn.matter} › {item.filedIn.cabinetType} without review. Confirm it if it is right, or pick another cabinet type.
        </Notice>
      )}
      {error && <Notice tone="error">{error.message}</Notice>}

      {suggestion && (
        <section aria-label="Suggestion" className="space-y-2">
          <p className="text-xs text-ink-soft">Suggestion {suggestion.modelVersionId ? `(model version #${suggestion.modelVersionId}) ` : ""}— {METHOD_WORDS[suggestion.method] ?? suggestion.method}.</p>
          {suggestion.noConfidentMatch && (
            <Notice tone="warning" title="No confident match">
              The model is unsure about this one. Check the text and choose the cabinet type yourself.
            </Notice>
          )}
          <ol className="space-y-1">
            {suggestion.ranked.slice(0, 5).map((r, i) => (
              <li key={r.cabinetTypeId}>
                <button
                  type="button"
                  onClick={() => (i === 0 && canAccept ? decide({ action: "accept" }) : refile(r.cabinetTypeId))}
                  className={`flex w-full items-center gap-2 rounded border px-2 py-1 text-left text-sm hover:bg-paper-deep ${i === 0 ? "border-verdigris bg-verdigris-light/40" : "border-paper-edge bg-white/70"}`}
                  data-testid={i === 0 ? "top-suggestion" : "runner-up"}
                >
                  <kbd className="rounded border border-paper-edge px-1 font-mono text-xs">{i === 0 ? "A" : i + 1}</kbd>
                  <span className="flex-1">{r.name}{r.source === "description" ? <span className="text-xs text-ink-faint"> (by description)</span> : null}</span>
                  <Confidence value={r.confidence} />
                </button>
              </li>
            ))}
          </ol>
          {suggestion.why.length > 0 && (
            <p className="text-xs text-ink-soft">
              Why: {suggestion.why.map((w) => (
                <span key={w.term} className="mr-1 inline-block rounded bg-paper-deep px-1 font-mono">{w.term}</span>
              ))}
            </p>
          )}
        </section>
      )}

      <CabinetPicker ref={pickerRef} types={types} onPick={refile} label={canAccept ? "Refile to any cabinet type" : "File to cabinet type"} />

      <label className="block text-xs text-ink-soft">
        Matter <kbd className="rounded border border-paper-edge px-1 font-mono">M</kbd>
        {suggestion?.matterAmbiguous && suggestion.matterCandidates.length > 1 && <span className="ml-1 text-amber">— several matters fit; pick one</span>}
        <select
          id="matter-select"
          value={matterId}
          onChange={(e) => setPicked(e.target.value === "" ? "" : Number(e.target.value))}
          className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink"
        >
          <option value="">Choose a matter…</option>
          {suggestion && suggestion.matterCandidates.length > 0 && (
            <optgroup label="Found in the document">
              {suggestion.matterCandidates.map((c) => (
                <option key={c.matterId} value={c.matterId}>
                  {c.number} — {c.title} ({c.reasons.join(", ")})
                </option>
              ))}
            </optgroup>
          )}
          <optgroup label="All matters">
            {matters.filter((m) => !candidateIds.has(m.id)).map((m) => (
              <option key={m.id} value={m.id}>
                {m.number} — {m.clientName}: {m.title}
              </option>
            ))}
          </optgroup>
        </select>
      </label>

      <div className="flex gap-2">
        {canAccept && (
          <Button onClick={() => decide({ action: "accept" })} disabled={!chosenMatter} data-testid="accept-button">
            Accept <kbd className="font-mono text-xs opacity-80">A</kbd>
          </Button>
        )}
        {list === "spot-check" && (
          <Button onClick={() => decide({ action: "confirm" })} data-testid="confirm-button">
            Confirm <kbd className="font-mono text-xs opacity-80">C</kbd>
          </Button>
        )}
      </div>
      {!chosenMatter && list === "review" && <p className="text-xs text-amber">Choose the matter before filing.</p>}

      {data?.document.text ? (
        <section aria-label="Text read">
          {(data.document.sensitive.ssn + data.document.sensitive.routing + data.document.sensitive.card > 0) && (
            <p className="mb-1 text-xs text-ink-soft">
              Sensitive numbers masked: {data.document.sensitive.ssn} SSN, {data.document.sensitive.routing} routing, {data.document.sensitive.card} card.
            </p>
          )}
          <TextPreview text={data.document.text} terms={suggestion?.why.map((w) => w.term) ?? []} />
        </section>
      ) : null}
      <p className="text-[11px] text-ink-faint">Suggestions are machine output: a person remains responsible for filing privileged or sensitive documents.</p>
    </div>
  );
});
