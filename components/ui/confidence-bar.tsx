import { cn } from "@/lib/utils";

interface ConfidenceBarProps {
  value: number;
  /** Width class of the bar, e.g. "w-16". */
  barClassName?: string;
  className?: string;
}

/** Confidence as a number with a thin bar beside it: the number says it, the bar only helps the eye. */
export function ConfidenceBar({ value, barClassName = "w-16", className }: ConfidenceBarProps) {
  const clamped = Math.max(0, Math.min(1, value));
  return (
    <span className={cn("inline-flex items-center gap-2", className)}>
      <span className="w-9 text-right font-mono text-xs tabular-nums">{Math.round(clamped * 100)}%</span>
      <span aria-hidden="true" className={cn("h-1 rounded-full bg-paper-deep", barClassName)}>
        <span className="block h-1 rounded-full bg-verdigris" style={{ width: `${clamped * 100}%` }} />
      </span>
    </span>
  );
}
