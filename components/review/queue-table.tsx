"use client";
import { Confidence } from "@/components/ui/confidence";
import type { QueueItem } from "./types";
import { HoldBadge } from "@/components/records/hold-badge";

type Sort = "age" | "confidence" | "cabinet" | "matter";

interface TableProps {
  items: QueueItem[];
  selectedId: number | null;
  checked: Set<number>;
  sort: Sort;
  dir: "asc" | "desc";
  onSort: (s: Sort) => void;
  onSelect: (id: number) => void;
  onCheck: (id: number) => void;
}

function ageOf(iso: string): string {
  const minutes = Math.max(0, Math.round((Date.now() - new Date(iso).getTime()) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  if (minutes < 48 * 60) return `${Math.round(minutes / 60)} h`;
  return `${Math.round(minutes / 1440)} d`;
}

export function QueueTable({ items, selectedId, checked, sort, dir, onSort, onSelect, onCheck }: TableProps) {
  const header = (key: Sort, label: string) => (
    <th className="py-1 pr-2 font-medium" aria-sort={sort === key ? (dir === "asc" ? "ascending" : "descending") : "none"}>
      <button type="button" onClick={() => onSort(key)} className="hover:text-ink">
        {label} {sort === key ? (dir === "asc" ? "▲" : "▼") : ""}
      </button>
    </th>
  );
  return (
    <table className="w-full border-collapse text-sm">
      <thead className="sticky top-0 z-10 bg-paper text-left text-xs text-ink-soft">
        <tr>
          <th className="w-6 py-1" aria-label="Select" />
          <th className="py-1 pr-2 font-medium">Document</th>
          {header("cabinet", "Suggested cabinet type")}
          {header("confidence", "Confidence")}
          {header("matter", "Matter")}
          {header("age", "Waiting")}
        </tr>
      </thead>
      <tbody>
        {items.map((item) => (
          <tr
            key={item.id}
            data-testid="queue-row"
            data-id={item.id}
            aria-selected={item.id === selectedId}
            onClick={() => onSelect(item.id)}
            className={`cursor-pointer border-t border-paper-edge align-top ${item.id === selectedId ? "bg-verdigris-light/50" : "hover:bg-paper-deep/60"}`}
          >
            <td className="py-1">
              <input type="checkbox" aria-label={`Select ${item.name}`} checked={checked.has(item.id)} onChange={() => onCheck(item.id)} onClick={(e) => e.stopPropagation()} />
            </td>
            <td className="max-w-[16rem] truncate py-1 pr-2" title={item.name}>
              {item.name}
              {item.status === "unreadable" && <span className="ml-1 rounded bg-brick-light px-1 text-xs text-brick">unreadable</span>}
              {item.legalHold && <HoldBadge />}
            </td>
            <td className="py-1 pr-2">
              {item.filedIn?.cabinetType ?? item.suggestion?.cabinetType ?? <span className="text-ink-faint">File by hand</span>}
              {item.suggestion?.noConfidentMatch && <span className="ml-1 rounded bg-amber-light px-1 text-xs text-amber">unsure</span>}
            </td>
            <td className="py-1 pr-2">
              <Confidence value={item.suggestion?.confidence ?? null} />
            </td>
            <td className="py-1 pr-2 font-mono text-xs">
              {item.filedIn?.matter ?? item.suggestion?.matter ?? "–"}
              {!item.filedIn && item.suggestion?.matterAmbiguous && item.suggestion.matter && <span className="text-amber"> ?</span>}
            </td>
            <td className="py-1 pr-2 text-xs text-ink-soft">{ageOf(item.uploadedAt)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
