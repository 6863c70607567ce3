/** A legal hold, in brick and in words (never colour alone, DESIGN §11). */
export function HoldBadge({ className = "" }: { className?: string }) {
  return (
    <span className={`ml-1 inline-block rounded border border-brick/40 bg-brick-light px-1 text-xs font-medium text-brick ${className}`} data-testid="hold-badge">
      Legal hold
    </span>
  );
}

/** A tombstone: the original destroyed, the row kept. */
export function DisposedBadge() {
  return <span className="ml-1 inline-block rounded border border-ink-faint/40 bg-paper-deep px-1 text-xs text-ink-soft">Destroyed</span>;
}
