/** A confidence as a number with a thin bar: never colour alone. */
export function Confidence({ value, className = "" }: { value: number | null; className?: string }) {
  if (value === null) return <span className={`text-xs text-ink-faint ${className}`}>–</span>;
  const pct = Math.round(value * 100);
  return (
    <span className={`inline-flex items-center gap-1.5 ${className}`} title={`${(value * 100).toFixed(1)}% confidence`}>
      <span className="font-mono text-xs tabular-nums">{pct}%</span>
      <span className="inline-block h-1 w-12 rounded bg-paper-deep" aria-hidden>
        <span className="block h-1 rounded bg-verdigris" style={{ width: `${pct}%` }} />
      </span>
    </span>
  );
}
