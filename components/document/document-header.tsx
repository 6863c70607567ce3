import type { DocumentDetail } from "@/lib/data/documents";
import type { FilingEvent } from "@/lib/data/filing-record";
import { actionWords } from "@/components/history/action-words";
import { HoldBadge } from "@/components/records/hold-badge";
import { DocumentStateBadge } from "./state-badge";
import type { DocumentState } from "./document-state";
import { formatKind, formatSize, formatUtc } from "./format";

interface DocumentHeaderProps {
  document: DocumentDetail;
  state: DocumentState;
  placement: FilingEvent | null;
  /** The Move control, when this person may move this document. */
  move?: React.ReactNode;
}

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-xs text-ink-faint">{label}</dt>
      <dd className="text-sm">{children}</dd>
    </div>
  );
}

/** Name, state and the facts of the upload; where the document is filed; the original. */
export function DocumentHeader({ document: d, state, placement, move }: DocumentHeaderProps) {
  const sensitive = d.sensitive.ssn + d.sensitive.routing + d.sensitive.card;
  return (
    <header className="space-y-3">
      <div className="flex flex-wrap items-start gap-3">
        <h1 className="min-w-0 break-words font-serif text-2xl" data-testid="document-name">
          {d.name}
        </h1>
        <DocumentStateBadge state={state} />
        {d.legalHold && <HoldBadge className="self-center" />}
        {d.disposedAt ? (
          <span className="ml-auto px-3 py-1.5 text-sm text-ink-soft">Original destroyed</span>
        ) : (
          <a
            href={`/api/documents/${d.id}/original`}
            className="ml-auto rounded border border-paper-edge bg-white/60 px-3 py-1.5 text-sm font-medium hover:bg-paper-deep"
            data-testid="download-original"
          >
            Download original
          </a>
        )}
      </div>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-3 lg:grid-cols-6">
        <Fact label="Document">
          <span className="font-mono text-xs">#{d.id}</span>
        </Fact>
        <Fact label="Uploaded by">{d.uploadedBy}</Fact>
        <Fact label="Uploaded (UTC)">
          <span className="font-mono text-xs">{formatUtc(d.uploadedAt)}</span>
        </Fact>
        <Fact label="Pages">{d.pageCount ?? "–"}</Fact>
        <Fact label="Text read by">{d.status === "reading" ? "still reading" : d.ocrUsed ? "OCR (scanned pages)" : "the file's own text"}</Fact>
        <Fact label="Size">
          {formatSize(d.sizeBytes)}{" "}
          <span className="break-all text-xs text-ink-faint" title={d.mediaType}>
            {formatKind(d.mediaType)}
          </span>
        </Fact>
      </dl>
      <div className="rounded border border-paper-edge bg-white/60 px-4 py-2 text-sm" data-testid="document-filed">
        {d.cabinetType || d.matter ? (
          <p>
            Filed in <span className="font-medium">{d.cabinetType ?? "no cabinet type"}</span>
            {d.matter && (
              <>
                {" "}of matter <span className="font-mono text-xs">{d.matter}</span>
              </>
            )}
            {placement && (
              <span className="text-ink-soft">
                {" "}· {actionWords(placement.action)} by {placement.user ?? "Foldwright"} on <span className="font-mono text-xs">{formatUtc(placement.at)}</span> UTC
              </span>
            )}
            {move}
          </p>
        ) : (
          <p className="text-ink-soft">Not filed yet.{state === "to_review" ? " It waits in To review for a person to accept or refile the suggestion." : ""}</p>
        )}
        {state === "auto_filed" && (
          <p className="mt-1 text-xs text-amber">Filed without review; it waits in the spot-check list until someone confirms it.</p>
        )}
        {d.status === "unreadable" && (
          <p className="mt-1 text-xs text-brick">
            Unreadable{d.reason ? `: ${d.reason}` : "."} The original is kept and can still be filed by hand.
          </p>
        )}
        {sensitive > 0 && (
          <p className="mt-1 text-xs text-ink-soft">
            Sensitive numbers found and masked below: {d.sensitive.ssn} SSN, {d.sensitive.routing} bank routing, {d.sensitive.card} card.
          </p>
        )}
      </div>
    </header>
  );
}
