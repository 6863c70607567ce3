"use client";
// The confirmation of a decision, with Undo for a short while. Every screen that files or moves
// shows its sentence through this one component, so Undo looks and works the same everywhere.
import { useCallback, useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { cn } from "@/lib/utils";
import { undoDecisions, type DecidedEvent } from "./undo";

/**
 * How long the Undo button stays (our choice: long enough to notice a slip, short enough that
 * Undo is not mistaken for Move; the server allows ten minutes, lib/data/filing-undo.ts).
 */
export const UNDO_SHOWN_SECONDS = 30;

export interface Decision {
  /** The sentence: "Accepted: lease.pdf → Contracts & leases, AQ-2026-0101." */
  text: string;
  events: DecidedEvent[];
  /** What was decided on: "lease.pdf", "12 documents". */
  subject: string;
  /** Where an undo puts it, as the rest of a sentence: "is back in To review". */
  undoneWords: string;
}

interface DecisionNoticeProps {
  decision: Decision | null;
  /** Called with the documents that went back, so the screen can show them again. */
  onUndone?: (documentIds: number[]) => void;
  className?: string;
}

type Phase = { kind: "decided" } | { kind: "undoing" } | { kind: "undone"; refused: string[] } | { kind: "failed"; message: string };

/** Keyed by the decision, so a new decision starts a fresh countdown. */
export function DecisionNotice(props: DecisionNoticeProps) {
  if (!props.decision) return null;
  return <DecisionNoticeFor key={props.decision.events.map((e) => e.eventId).join(",") || props.decision.text} {...props} decision={props.decision} />;
}

function DecisionNoticeFor({ decision, onUndone, className }: DecisionNoticeProps & { decision: Decision }) {
  const [phase, setPhase] = useState<Phase>({ kind: "decided" });
  const [left, setLeft] = useState(UNDO_SHOWN_SECONDS);
  const canUndo = decision.events.length > 0 && phase.kind === "decided" && left > 0;

  useEffect(() => {
    if (left <= 0 || phase.kind !== "decided") return;
    const t = setTimeout(() => setLeft((s) => s - 1), 1000);
    return () => clearTimeout(t);
  }, [left, phase.kind]);

  const undo = useCallback(async () => {
    setPhase({ kind: "undoing" });
    try {
      const refused = await undoDecisions(decision.events);
      setPhase({ kind: "undone", refused });
      onUndone?.(decision.events.map((e) => e.documentId));
    } catch (e) {
      setPhase({ kind: "failed", message: e instanceof Error ? e.message : String(e) });
    }
  }, [decision.events, onUndone]);

  // U undoes, as long as the button shows and the person is not typing somewhere.
  useEffect(() => {
    if (!canUndo) return;
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement;
      if (["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName) || target.isContentEditable || e.metaKey || e.ctrlKey || e.altKey) return;
      if (e.key.toLowerCase() !== "u") return;
      e.preventDefault();
      e.stopImmediatePropagation();
      void undo();
    };
    window.addEventListener("keydown", onKey, true);
    return () => window.removeEventListener("keydown", onKey, true);
  }, [canUndo, undo]);

  const failed = phase.kind === "failed" || (phase.kind === "undone" && phase.refused.length > 0);
  return (
    <div
      role="status"
      aria-live="polite"
      data-testid="decision-notice"
      className={cn("flex flex-wrap items-center gap-x-3 gap-y-1 rounded border-l-4 px-4 py-2 text-sm", failed ? "border-brick bg-brick-light/60" : "border-verdigris bg-verdigris-light/50", className)}
    >
      <p className="min-w-0 flex-1 break-words">
        {phase.kind === "undone"
          ? phase.refused.length
            ? `Undone ${decision.events.length - phase.refused.length} of ${decision.events.length}. Not undone: ${phase.refused.join(" ")}`
            : `Undone: ${decision.subject} ${decision.undoneWords}. The undo is on the record.`
          : phase.kind === "failed"
            ? `Not undone: ${phase.message}`
            : decision.text}
      </p>
      {canUndo && (
        <Button variant="quiet" onClick={undo} data-testid="undo-button" aria-label={`Undo (U), ${left} seconds left`}>
          Undo <kbd className="font-mono text-xs opacity-80">U</kbd>
          <span className="font-mono text-xs text-ink-soft" aria-hidden="true">{left}s</span>
        </Button>
      )}
      {phase.kind === "undoing" && <span className="text-xs text-ink-soft">Undoing…</span>}
    </div>
  );
}
