import Link from "next/link";
import type { CabinetCount } from "@/lib/data/documents";

/** Matters and their cabinets with counts; the chosen one is marked. */
export function CabinetTree({ cabinets, matterId, cabinetTypeId }: { cabinets: CabinetCount[]; matterId?: number; cabinetTypeId?: number }) {
  const matters = [...new Map(cabinets.map((c) => [c.matterId, c])).values()];
  if (matters.length === 0) {
    return <p className="text-sm text-ink-soft">No filed documents yet. Documents appear here once they are accepted or filed in To review.</p>;
  }
  return (
    <nav aria-label="Cabinets" className="space-y-3 text-sm">
      {matters.map((m) => (
        <div key={m.matterId}>
          <Link href={`/cabinets?matter=${m.matterId}`} className={`block font-medium hover:underline ${matterId === m.matterId && !cabinetTypeId ? "text-verdigris" : ""}`}>
            <span className="font-mono text-xs">{m.matter}</span> {m.clientName}
            {m.restricted && <span className="ml-1 rounded bg-brick-light px-1 text-xs text-brick">restricted</span>}
          </Link>
          <p className="text-xs text-ink-faint">{m.matterTitle}</p>
          <ul className="ml-2 mt-1 border-l border-paper-edge pl-2">
            {cabinets
              .filter((c) => c.matterId === m.matterId)
              .map((c) => {
                const active = matterId === c.matterId && cabinetTypeId === c.cabinetTypeId;
                return (
                  <li key={c.cabinetTypeId}>
                    <Link
                      href={`/cabinets?matter=${c.matterId}&cabinetType=${c.cabinetTypeId}`}
                      aria-current={active ? "page" : undefined}
                      className={`flex justify-between gap-2 rounded px-1 hover:bg-paper-deep ${active ? "bg-verdigris-light" : ""}`}
                    >
                      <span>{c.cabinetType}</span>
                      <span className="font-mono text-xs text-ink-soft">{c.documents}</span>
                    </Link>
                  </li>
                );
              })}
          </ul>
        </div>
      ))}
    </nav>
  );
}
