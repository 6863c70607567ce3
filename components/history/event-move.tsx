import type { FilingEvent } from "@/lib/data/filing-record";

type Move = Pick<FilingEvent, "fromCabinetType" | "toCabinetType" | "fromMatter" | "toMatter">;

function Place({ cabinetType, matter }: { cabinetType: string | null; matter: string | null }) {
  if (!cabinetType && !matter) return <span className="text-ink-faint">nowhere yet</span>;
  return (
    <span>
      {cabinetType ?? <span className="text-ink-faint">no cabinet type</span>}
      {matter && <span className="whitespace-nowrap font-mono text-xs text-ink-soft"> · {matter}</span>}
    </span>
  );
}

/** Where an event moved a document: "from" on one line and "→ to" below it, or just "to" when it came from nowhere. */
export function EventMove({ event }: { event: Move }) {
  const hasFrom = event.fromCabinetType !== null || event.fromMatter !== null;
  return (
    <span className="block">
      {hasFrom && (
        <span className="block text-ink-soft">
          <Place cabinetType={event.fromCabinetType} matter={event.fromMatter} />
        </span>
      )}
      <span className="block">
        {hasFrom && (
          <span aria-label="to" className="pr-1 text-ink-faint">
            →
          </span>
        )}
        <Place cabinetType={event.toCabinetType} matter={event.toMatter} />
      </span>
    </span>
  );
}
