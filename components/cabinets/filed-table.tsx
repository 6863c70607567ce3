import Link from "next/link";
import type { DocumentSummary } from "@/lib/data/documents";
import { DisposedBadge, HoldBadge } from "@/components/records/hold-badge";
import { RetentionWords } from "@/components/records/retention-words";
import { MoveButton } from "@/components/filing/move-dialog";

const HOW: Record<string, string> = { accepted: "Accepted", refiled: "Refiled", by_hand: "Filed by hand", auto: "Auto-filed", imported: "Imported" };

/** `movable`: the viewer may move documents (a Move… control per row, inside a MoveProvider). */
export function FiledTable({ items, movable = false }: { items: DocumentSummary[]; movable?: boolean }) {
  return (
    <table className="w-full border-collapse text-sm">
      <thead className="sticky top-0 bg-paper text-left text-xs text-ink-soft">
        <tr>
          <th className="py-1 pr-2 font-medium">Document</th>
          <th className="py-1 pr-2 font-medium">Matter</th>
          <th className="py-1 pr-2 font-medium">Cabinet type</th>
          <th className="py-1 pr-2 font-medium">Filed (UTC)</th>
          <th className="py-1 pr-2 font-medium">How, by whom</th>
          <th className="py-1 pr-2 font-medium">Retention date</th>
          {movable && <th className="py-1 pr-2 font-medium"><span className="sr-only">Move</span></th>}
        </tr>
      </thead>
      <tbody>
        {items.map((d) => (
          <tr key={d.id} className="border-t border-paper-edge align-top" data-testid="filed-row">
            <td className="max-w-[22rem] py-1 pr-2">
              {/* The badges sit outside the truncated name so a long name never hides a hold. */}
              <div className="flex min-w-0 items-center">
                <Link href={`/documents/${d.id}`} className="truncate text-verdigris hover:underline" title={d.name}>
                  {d.name}
                </Link>
                {d.legalHold && <HoldBadge className="shrink-0" />}
                {d.disposedAt && <DisposedBadge />}
              </div>
            </td>
            <td className="py-1 pr-2 font-mono text-xs">{d.matter ?? "–"}</td>
            <td className="py-1 pr-2">{d.cabinetType ?? "–"}</td>
            <td className="py-1 pr-2 font-mono text-xs">{d.filedAt ? d.filedAt.slice(0, 16).replace("T", " ") : "–"}</td>
            <td className="py-1 pr-2 text-xs">
              {d.filedHow ? HOW[d.filedHow] ?? d.filedHow : "–"}
              {d.filedBy ? `, ${d.filedBy}` : d.filedHow === "auto" ? ", Foldwright" : ""}
            </td>
            <td className="py-1 pr-2" data-testid="retention-cell">
              <RetentionWords retention={d.retention} held={d.legalHold} disposedAt={d.disposedAt} />
            </td>
            {movable && (
              <td className="py-1 pr-2">
                {!d.disposedAt && <MoveButton doc={{ id: d.id, name: d.name, cabinetTypeId: d.cabinetTypeId, matterId: d.matterId }} />}
              </td>
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
