import Link from "next/link";
import type { DocumentDetail } from "@/lib/data/documents";
import type { HoldView } from "@/lib/data/holds";
import { formatUtc } from "@/components/document/format";
import { RETENTION_CAUTION } from "@/lib/retention";
import { RetentionWords } from "./retention-words";

interface DocumentRecordsProps {
  document: DocumentDetail;
  holds: HoldView[];
  canPlaceHold: boolean;
  disposal: { batchId: number; proposedBy: string; approvedBy: string | null } | null;
}

/** Retention date, legal holds (brick, in words) and the tombstone, on the document page. */
export function DocumentRecords({ document: d, holds, canPlaceHold, disposal }: DocumentRecordsProps) {
  return (
    <section aria-label="Retention and holds" className="space-y-2" data-testid="document-records">
      {holds.length > 0 && (
        <div role="status" className="rounded border-l-4 border-brick bg-brick-light/60 px-4 py-2 text-sm" data-testid="hold-banner">
          <p className="font-semibold text-brick">Legal hold: this document must not be destroyed.</p>
          <ul className="mt-1 space-y-0.5 text-xs">
            {holds.map((h) => (
              <li key={h.id}>
                Hold #{h.id} on {h.scope === "matter" ? <>matter <span className="font-mono">{h.matter}</span></> : "this document"} — {h.reason} (ref. <span className="font-mono">{h.reference}</span>), placed by {h.placedBy} on{" "}
                <span className="font-mono">{formatUtc(h.placedAt)}</span> UTC.
              </li>
            ))}
          </ul>
        </div>
      )}
      {d.disposedAt && (
        <div className="rounded border-l-4 border-ink-faint bg-paper-deep px-4 py-2 text-sm" data-testid="tombstone">
          <p className="font-semibold">Destroyed on <span className="font-mono">{formatUtc(d.disposedAt)}</span> UTC. Only this record remains: the original was deleted from storage and its text cleared.</p>
          {disposal && (
            <p className="mt-1 text-xs">
              Disposal batch <Link href={`/disposal/batches/${disposal.batchId}`} className="text-verdigris hover:underline">#{disposal.batchId}</Link>, proposed by {disposal.proposedBy}, approved by {disposal.approvedBy ?? "–"}.
            </p>
          )}
        </div>
      )}
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1 rounded border border-paper-edge bg-white/60 px-4 py-2 text-sm">
        <span>
          <span className="text-xs text-ink-faint">Retention date </span>
          <RetentionWords retention={d.retention} held={d.legalHold} disposedAt={d.disposedAt} long />
        </span>
        {canPlaceHold && !d.disposedAt && (
          <Link href={`/holds?document=${d.id}`} className="ml-auto text-xs text-verdigris hover:underline" data-testid="hold-this">
            Place a legal hold on this document
          </Link>
        )}
        {d.retention.dueOn && !d.disposedAt && <p className="basis-full text-xs text-ink-soft">{RETENTION_CAUTION}</p>}
      </div>
    </section>
  );
}
