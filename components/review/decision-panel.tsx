"use client";
import { forwardRef, useRef, useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Confidence } from "@/components/ui/confidence";
import { Notice } from "@/components/ui/notice";
import { CabinetPicker } from "./cabinet-picker";
import { MatterCombobox } from "./matter-combobox";
import { TextPreview } from "./text-preview";
import { getJson, type FilingPayload } from "./api";
import type { DocumentView, MatterOption, Option, QueueItem } from "./types";

interface PanelProps {
  item: QueueItem;
  list: "review" | "spot-check";
  types: Option[];
  matters: MatterOption[];
  onDecide: (item: QueueItem, payload: FilingPayload) => void;
  /** Matter ids this person filed into last, most recent first (offered after the found ones). */
  recent: number[];
  /** Hands focus back to the queue (after Escape or a choice). */
  onQueueFocus: () => void;
}

const METHOD_WORDS: Record<string, string> = {
  model: "from the current model",
  blended: "from the model; types with few examples ranked by their descriptions",
  cold_start: "ranked by the cabinet types' descriptions and keywords: no model yet",
};

/** The right panel: the document, the suggestion and the decision controls. */
export const DecisionPanel = forwardRef<HTMLInputElement, PanelProps>(function DecisionPanel({ item, list, types, matters, onDecide, recent, onQueueFocus }, pickerRef) {
  const { data, error } = useSWR<DocumentView>(`/api/documents/${item.id}`, getJson);
  const suggestion = data?.suggestion ?? null;
  // null until the person picks: then the filed or suggested matter is the default.
  const [picked, setPicked] = useState<number | "" | null>(null);
  const matterId = picked ?? item.filedIn?.matterId ?? suggestion?.matterId ?? item.suggestion?.matterId ?? "";

  const chosenMatter = matterId === "" ? undefined : matterId;
  const canAccept = list === "review" && Boolean(item.suggestion?.cabinetTypeId);
  // A decision that waits for its matter: A (or a cabinet type) with no matter yet opens the
  // matter step, and choosing the matter there files it; Escape drops it, filing nothing.
  const [pending, setPendingState] = useState<FilingPayload | null>(null);
  // Also in a ref: the matter step reads it the moment a matter is chosen, whatever render it is in.
  const pendingRef = useRef<FilingPayload | null>(null);
  const setPending = (p: FilingPayload | null) => {
    pendingRef.current = p;
    setPendingState(p);
  };
  const decide = (payload: FilingPayload) => {
    const m = payload.matterId ?? chosenMatter;
    if (!m && list === "review") {
      setPending(payload);
      document.getElementById("matter-select")?.focus();
      return;
    }
    onDecide(item, { ...payload, matterId: m });
  };
  const refile = (cabinetTypeId: number) => decide({ action: list === "spot-check" ? "move" : canAccept ? "refile" : "file", cabinetTypeId });
  const ranking = suggestion?.ranked.map((r) => r.cabinetTypeId) ?? [];
  const pendingWords = pending ? (pending.action === "accept" ? `accept ${suggestion?.ranked[0]?.name ?? item.suggestion?.cabinetType ?? "the suggestion"}` : `file to ${types.find((t) => t.id === pending.cabinetTypeId)?.name ?? "that cabinet type"}`) : null;

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

      <CabinetPicker ref={pickerRef} types={types} ranking={ranking} onPick={refile} onDone={onQueueFocus} label={canAccept ? "Refile to any cabinet type" : "File to cabinet type"} />

      <MatterCombobox
        id="matter-select"
        label="Matter (M)"
        matters={matters}
        candidates={suggestion?.matterCandidates ?? []}
        recent={recent}
        value={chosenMatter ?? null}
        onChange={(id) => {
          setPicked(id);
          const waiting = pendingRef.current;
          if (waiting) {
            setPending(null);
            onDecide(item, { ...waiting, matterId: id });
          }
        }}
        onDone={() => {
          setPending(null);
          onQueueFocus();
        }}
        hint={
          <>
            {suggestion?.matterAmbiguous && suggestion.matterCandidates.length > 1 && <span className="block text-xs text-amber-dark">Several matters fit; pick one.</span>}
            {pendingWords && (
              <span className="block text-xs text-amber-dark" role="status" data-testid="pending-decision">
                Choose the matter to {pendingWords}: Enter files it, Escape leaves it unfiled.
              </span>
            )}
          </>
        }
      />

      <div className="flex gap-2">
        {canAccept && (
          <Button onClick={() => decide({ action: "accept" })} data-testid="accept-button">
            {chosenMatter ? "Accept" : "Accept — choose the matter"} <kbd className="font-mono text-xs opacity-80">A</kbd>
          </Button>
        )}
        {list === "spot-check" && (
          <Button onClick={() => decide({ action: "confirm" })} data-testid="confirm-button">
            Confirm <kbd className="font-mono text-xs opacity-80">C</kbd>
          </Button>
        )}
      </div>

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
