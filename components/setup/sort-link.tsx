import Link from "next/link";
import { hrefWith, type Dir } from "./list-query";

interface SortLinkProps {
  label: string;
  sortKey: string;
  path: string;
  params: Record<string, string>;
  active: string;
  dir: Dir;
  className?: string;
  /** The address parameters this table sorts by (two tables on one page use two pairs). */
  sortParam?: string;
  dirParam?: string;
}

/** A column header that sorts by changing the address (state in the URL); a second click reverses. */
export function SortLink({ label, sortKey, path, params, active, dir, className, sortParam = "sort", dirParam = "dir" }: SortLinkProps) {
  const on = active === sortKey;
  const next: Dir = on && dir === "asc" ? "desc" : "asc";
  return (
    <th scope="col" aria-sort={on ? (dir === "asc" ? "ascending" : "descending") : "none"} className={className}>
      <Link href={hrefWith(path, params, { [sortParam]: sortKey, [dirParam]: next })} className="inline-flex items-center gap-1 font-medium hover:text-ink" scroll={false}>
        {label}
        <span aria-hidden="true" className={on ? "text-ink" : "text-ink-faint/60"}>
          {on ? (dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
      </Link>
    </th>
  );
}
