import { ConfidenceBar } from "@/components/ui/confidence-bar";

/** A confidence that may be missing: a dash, or the number with its thin bar. */
export function Confidence({ value, className = "" }: { value: number | null; className?: string }) {
  if (value === null) return <span className={`text-xs text-ink-faint ${className}`}>–</span>;
  return <ConfidenceBar value={value} barClassName="w-12" className={className} />;
}
