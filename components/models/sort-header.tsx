"use client";

export type SortDir = "asc" | "desc";

interface SortHeaderProps<K extends string> {
  label: string;
  sortKey: K;
  active: K;
  dir: SortDir;
  onSort: (key: K) => void;
  className?: string;
}

/** A column header that sorts on click or Enter/Space (it is a button), and says the order to screen readers. */
export function SortHeader<K extends string>({ label, sortKey, active, dir, onSort, className }: SortHeaderProps<K>) {
  const on = active === sortKey;
  return (
    <th scope="col" aria-sort={on ? (dir === "asc" ? "ascending" : "descending") : "none"} className={className}>
      <button type="button" onClick={() => onSort(sortKey)} className="inline-flex items-center gap-1 rounded font-medium hover:text-ink">
        {label}
        <span aria-hidden="true" className={on ? "text-ink" : "text-ink-faint/60"}>
          {on ? (dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
      </button>
    </th>
  );
}
