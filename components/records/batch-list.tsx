import Link from "next/link";
import { formatUtc } from "@/components/document/format";
import type { BatchSummary } from "@/lib/data/disposal-batches";

const STATUS_WORDS = { proposed: "Waiting for approval", approved: "Approved and carried out", rejected: "Rejected" } as const;

/** Disposal batches with their decision; approved ones link their certificate. */
export function BatchList({ batches, empty }: { batches: BatchSummary[]; empty: string }) {
  if (batches.length === 0) return <p className="rounded border border-dashed border-paper-edge px-4 py-4 text-sm text-ink-soft">{empty}</p>;
  return (
    <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60 text-sm" data-testid="batch-list">
      {batches.map((b) => (
        <li key={b.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 px-3 py-2">
          <Link href={`/disposal/batches/${b.id}`} className="font-medium text-verdigris hover:underline">
            Batch #{b.id}
          </Link>
          <span className={b.status === "proposed" ? "text-amber" : "text-ink-soft"}>{STATUS_WORDS[b.status]}</span>
          <span className="text-xs text-ink-soft">
            {b.status === "approved" ? `${b.disposed} of ${b.documents} destroyed` : `${b.documents} ${b.documents === 1 ? "document" : "documents"}`} · proposed by {b.proposedBy},{" "}
            <span className="font-mono">{formatUtc(b.proposedAt)}</span>
            {b.decidedBy && <> · {b.status === "rejected" ? "rejected" : "approved"} by {b.decidedBy}</>}
          </span>
          <span className="basis-full truncate text-xs text-ink-soft">{b.note}</span>
          {b.status === "approved" && (
            <span className="text-xs">
              Certificate: <a href={`/api/disposal/batches/${b.id}/certificate?format=pdf`} className="text-verdigris hover:underline">PDF</a> ·{" "}
              <a href={`/api/disposal/batches/${b.id}/certificate?format=csv`} className="text-verdigris hover:underline">CSV</a>
            </span>
          )}
        </li>
      ))}
    </ul>
  );
}
