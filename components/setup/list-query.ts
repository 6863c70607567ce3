// Sort and filter state of the Setup tables, read from the URL (so a view can be bookmarked or
// sent) and written back into links. Pure: no React, no database.
export type Dir = "asc" | "desc";
export type SearchParams = Record<string, string | string[] | undefined>;

/** Single, trimmed, non-empty values only: an empty form field means "any". */
export function readParams(sp: SearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(sp)) {
    const s = Array.isArray(v) ? v[0] : v;
    if (s !== undefined && s.trim() !== "") out[k] = s.trim();
  }
  return out;
}

export function pick<T extends string>(value: string | undefined, allowed: readonly T[], fallback: T): T {
  return allowed.includes(value as T) ? (value as T) : fallback;
}

/** The page's address with some parameters changed (undefined removes one). */
export function hrefWith(path: string, params: Record<string, string>, change: Record<string, string | undefined>): string {
  const p = new URLSearchParams(params);
  for (const [k, v] of Object.entries(change)) {
    if (v === undefined) p.delete(k);
    else p.set(k, v);
  }
  return p.size ? `${path}?${p}` : path;
}

/** Sorts a copy by one key; ties keep the order given. Text compares without regard to case. */
export function sortBy<T>(items: T[], key: (item: T) => string | number | boolean | null, dir: Dir): T[] {
  const sign = dir === "asc" ? 1 : -1;
  return [...items].sort((a, b) => {
    const x = key(a);
    const y = key(b);
    if (x === y) return 0;
    if (x === null) return 1;
    if (y === null) return -1;
    if (typeof x === "string" && typeof y === "string") return sign * x.localeCompare(y, "en", { sensitivity: "base", numeric: true });
    return sign * (x < y ? -1 : 1);
  });
}

/** True when every word of the query appears in one of the texts (case-insensitive). */
export function matchesQuery(q: string | undefined, texts: (string | null | undefined)[]): boolean {
  if (!q) return true;
  const hay = texts.filter(Boolean).join(" ").toLowerCase();
  return q
    .toLowerCase()
    .split(/\s+/)
    .every((w) => hay.includes(w));
}
