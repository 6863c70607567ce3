import Link from "next/link";
import type { DocumentDetail } from "@/lib/data/documents";

/** Cabinets › matter › cabinet type › the file: the way back to where the document is filed. */
export function DocumentBreadcrumb({ document: d, historyLink }: { document: DocumentDetail; historyLink: boolean }) {
  const link = "text-verdigris hover:underline";
  return (
    <nav aria-label="Breadcrumb" className="flex flex-wrap items-center gap-x-1 text-xs text-ink-soft" data-testid="breadcrumb">
      <ol className="flex min-w-0 flex-wrap items-center gap-x-1">
        <li>
          <Link href="/cabinets" className={link}>Cabinets</Link>
        </li>
        {d.matterId && d.matter && (
          <li>
            › <Link href={`/cabinets?matter=${d.matterId}`} className={`${link} font-mono`}>{d.matter}</Link>
          </li>
        )}
        {d.matterId && d.cabinetTypeId && d.cabinetType && (
          <li>
            › <Link href={`/cabinets?matter=${d.matterId}&cabinetType=${d.cabinetTypeId}`} className={link}>{d.cabinetType}</Link>
          </li>
        )}
        {!d.filedAt && <li>› not filed yet</li>}
        <li className="min-w-0 max-w-full truncate" aria-current="page">› {d.name}</li>
      </ol>
      {historyLink && (
        <Link href={`/history?document=${d.id}`} className={`${link} ml-auto`}>
          This document in History
        </Link>
      )}
    </nav>
  );
}
