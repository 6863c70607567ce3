import { cn } from "@/lib/utils";

export type IntakeState = "queued" | "uploading" | "reading" | "ready" | "unreadable" | "duplicate" | "rejected" | "restricted";

const LABELS: Record<IntakeState, string> = {
  queued: "Waiting",
  uploading: "Uploading",
  reading: "Reading",
  ready: "Ready",
  unreadable: "Unreadable",
  duplicate: "Already held",
  rejected: "Not accepted",
  restricted: "Restricted",
};

/** The state in words, with a colour as a second cue only. */
export function StateBadge({ state }: { state: IntakeState }) {
  return (
    <span
      data-state={state}
      className={cn(
        "inline-block rounded px-2 py-0.5 text-xs font-medium",
        state === "ready" && "bg-verdigris-light text-verdigris-dark",
        (state === "reading" || state === "uploading" || state === "queued") && "bg-paper-deep text-ink-soft",
        (state === "duplicate" || state === "restricted") && "bg-amber-light text-amber",
        (state === "unreadable" || state === "rejected") && "bg-brick-light text-brick",
      )}
    >
      {LABELS[state]}
    </span>
  );
}
