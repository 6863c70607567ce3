"use client";
// A short reason for a refile or a move, with the common ones a click away. The reason goes on
// the filing record (History's Reason column and its CSV).
import { cn } from "@/lib/utils";

/** The reasons people give most (our own list, from the issue that asked for reasons). */
export const COMMON_REASONS = ["wrong matter", "wrong type", "duplicate"] as const;
export const REASON_MAX = 600; // the record's column (db/migrations/20261201000005_filing.ts)

interface ReasonFieldProps {
  id: string;
  value: string;
  onChange: (reason: string) => void;
  required?: boolean;
  label?: string;
}

export function ReasonField({ id, value, onChange, required, label }: ReasonFieldProps) {
  return (
    <div className="space-y-1 text-xs text-ink-soft" data-testid="reason-field">
      <label htmlFor={id} className="block">
        {label ?? "Reason"} {required ? <span className="text-ink">(needed)</span> : <span>(optional)</span>}
      </label>
      <div className="flex flex-wrap gap-1" role="group" aria-label="Common reasons">
        {COMMON_REASONS.map((r) => (
          <button
            key={r}
            type="button"
            aria-pressed={value === r}
            onClick={() => onChange(value === r ? "" : r)}
            className={cn("rounded border px-2 py-0.5 text-xs", value === r ? "border-verdigris bg-verdigris-light text-ink" : "border-paper-edge bg-white/70 text-ink hover:bg-paper-deep")}
            data-testid="common-reason"
          >
            {r}
          </button>
        ))}
      </div>
      <input
        id={id}
        value={value}
        maxLength={REASON_MAX}
        aria-required={required}
        onChange={(e) => onChange(e.target.value)}
        placeholder="or say it in a few words"
        className="w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink"
      />
    </div>
  );
}
