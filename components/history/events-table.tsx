import Link from "next/link";
import type { FilingEvent } from "@/lib/data/filing-record";
import { ConfidenceBar } from "@/components/ui/confidence-bar";
import { formatUtc } from "@/components/document/format";
import { actionWords } from "./action-words";
import { EventMove } from "./event-move";

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";
const TD = "px-2 py-1 align-top";

/** The filing record, newest first, dense with a header that stays put while the rows scroll. */
export function EventsTable({ items }: { items: FilingEvent[] }) {
  return (
    <div className="max-h-[70vh] overflow-auto rounded border border-paper-edge bg-white/70" tabIndex={0} aria-label="Filing record, scrollable">
      <table className="w-full border-collapse text-sm" data-testid="history-table">
        <thead>
          <tr>
            <th scope="col" className={TH}>When (UTC)</th>
            <th scope="col" className={TH}>Document</th>
            <th scope="col" className={TH}>Action</th>
            <th scope="col" className={TH}>Who</th>
            <th scope="col" className={TH}>From → to</th>
            <th scope="col" className={TH}>Model</th>
            <th scope="col" className={TH}>Confidence</th>
            <th scope="col" className={TH}>Reason</th>
          </tr>
        </thead>
        <tbody>
          {items.map((e) => (
            <tr key={e.id} className="border-t border-paper-edge/70 hover:bg-paper/60" data-testid="history-row" data-action={e.action}>
              <td className={`${TD} whitespace-nowrap font-mono text-xs`}>{formatUtc(e.at, true)}</td>
              <td className={`${TD} max-w-44`}>
                <Link href={`/documents/${e.documentId}`} className="block truncate text-verdigris hover:underline" title={e.documentName}>
                  <span className="font-mono text-xs text-ink-faint">#{e.documentId}</span> {e.documentName}
                </Link>
              </td>
              <td className={`${TD} whitespace-nowrap font-medium`}>{actionWords(e.action)}</td>
              <td className={`${TD} min-w-24`}>{e.user ?? <span className="text-ink-soft">Foldwright</span>}</td>
              <td className={`${TD} min-w-40`}><EventMove event={e} /></td>
              <td className={`${TD} whitespace-nowrap font-mono text-xs`}>{e.modelVersionId !== null ? `#${e.modelVersionId}` : "–"}</td>
              <td className={`${TD} whitespace-nowrap`}>{e.confidence !== null ? <ConfidenceBar value={e.confidence} barClassName="w-12" /> : "–"}</td>
              <td className={`${TD} min-w-40 text-xs text-ink-soft`}>{e.reason ?? ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
