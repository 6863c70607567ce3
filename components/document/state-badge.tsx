import { cn } from "@/lib/utils";
import { STATE_WORDS, type DocumentState } from "./document-state";

/** The state in words; the colour is only a second cue. */
export function DocumentStateBadge({ state }: { state: DocumentState }) {
  return (
    <span
      data-state={state}
      data-testid="document-state"
      className={cn(
        "inline-block rounded px-2 py-0.5 text-xs font-medium",
        state === "filed" && "bg-verdigris-light text-verdigris-dark",
        (state === "reading" || state === "waiting") && "bg-paper-deep text-ink-soft",
        (state === "to_review" || state === "auto_filed") && "bg-amber-light text-amber",
        state === "unreadable" && "bg-brick-light text-brick",
      )}
    >
      {STATE_WORDS[state]}
    </span>
  );
}
