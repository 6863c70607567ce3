import type { FilingEvent } from "@/lib/data/filing-record";
import { actionWords } from "@/components/history/action-words";
import { EventMove } from "@/components/history/event-move";
import { ConfidenceBar } from "@/components/ui/confidence-bar";
import { formatUtc } from "./format";

/** The document's filing record, oldest first. */
export function Timeline({ events }: { events: FilingEvent[] }) {
  return (
    <section aria-labelledby="timeline-heading">
      <h2 id="timeline-heading" className="mb-1 font-serif text-lg">On the record</h2>
      {events.length === 0 ? (
        <p className="rounded border border-dashed border-paper-edge px-4 py-3 text-sm text-ink-soft">
          Nothing on the record yet: the first entry is written when Foldwright suggests a place for this document.
        </p>
      ) : (
        <ol className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/70" data-testid="document-timeline">
          {events.map((e) => (
            <li key={e.id} className="grid grid-cols-[10.5rem_minmax(0,1fr)] gap-x-3 px-3 py-2 text-sm" data-action={e.action}>
              <span className="whitespace-nowrap font-mono text-xs text-ink-soft">{formatUtc(e.at, true)}</span>
              <div className="space-y-0.5">
                <p>
                  <span className="font-medium">{actionWords(e.action)}</span>
                  <span className="text-ink-soft"> by {e.user ?? "Foldwright"}</span>
                  {e.modelVersionId !== null && <span className="text-xs text-ink-faint"> · model version #{e.modelVersionId}</span>}
                </p>
                <div className="flex flex-wrap items-end gap-x-3">
                  <EventMove event={e} />
                  {e.confidence !== null && <ConfidenceBar value={e.confidence} barClassName="w-12" />}
                </div>
                {e.reason && <p className="text-xs text-ink-soft">{e.reason}</p>}
              </div>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
