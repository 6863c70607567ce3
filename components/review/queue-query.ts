// The To review screen's sort, filters, search and page, as they stand in the address
// (/review?sort=age&dir=desc&q=…) and in the browser's memory. Pure: the page parses the address
// on the server with it, the board writes it back on every change.
export type QueueSort = "age" | "confidence" | "cabinet" | "matter";

export interface QueueQuery {
  list: "review" | "spot-check";
  sort: QueueSort;
  dir: "asc" | "desc";
  cabinetType: number | null;
  matter: number | null;
  /** "", "above:0.9", "below:0.5" … */
  confidence: string;
  q: string;
  page: number;
}

export const DEFAULT_QUERY: QueueQuery = { list: "review", sort: "age", dir: "asc", cabinetType: null, matter: null, confidence: "", q: "", page: 1 };
export const QUEUE_PAGE_SIZE = 100;
/** The cookie (path /review) that remembers the last query, so coming back from the rail keeps it. */
export const QUERY_COOKIE = "foldwright_review_query";

const SORTS: QueueSort[] = ["age", "confidence", "cabinet", "matter"];
const CONFIDENCES = ["above:0.9", "above:0.7", "below:0.7", "below:0.5"];

type Params = URLSearchParams | Record<string, string | string[] | undefined>;

function get(p: Params, key: string): string | undefined {
  if (p instanceof URLSearchParams) return p.get(key) ?? undefined;
  const v = p[key];
  return Array.isArray(v) ? v[0] : v;
}

function positive(v: string | undefined): number | null {
  const n = Number(v);
  return v && Number.isInteger(n) && n > 0 ? n : null;
}

/** Reads a query from the address; anything unknown or malformed falls back to its default. */
export function parseQueueQuery(p: Params): QueueQuery {
  const sort = get(p, "sort");
  const confidence = get(p, "confidence") ?? "";
  return {
    list: get(p, "list") === "spot-check" ? "spot-check" : "review",
    sort: SORTS.includes(sort as QueueSort) ? (sort as QueueSort) : DEFAULT_QUERY.sort,
    dir: get(p, "dir") === "desc" ? "desc" : "asc",
    cabinetType: positive(get(p, "cabinetType")),
    matter: positive(get(p, "matter")),
    confidence: CONFIDENCES.includes(confidence) ? confidence : "",
    q: (get(p, "q") ?? "").slice(0, 200),
    page: positive(get(p, "page")) ?? 1,
  };
}

/** The address's query string for a query: only what differs from the defaults. */
export function queueSearchParams(q: QueueQuery): URLSearchParams {
  const out = new URLSearchParams();
  if (q.list !== DEFAULT_QUERY.list) out.set("list", q.list);
  if (q.sort !== DEFAULT_QUERY.sort || q.dir !== DEFAULT_QUERY.dir) {
    out.set("sort", q.sort);
    out.set("dir", q.dir);
  }
  if (q.cabinetType) out.set("cabinetType", String(q.cabinetType));
  if (q.matter) out.set("matter", String(q.matter));
  if (q.confidence) out.set("confidence", q.confidence);
  if (q.q.trim()) out.set("q", q.q.trim());
  if (q.page > 1) out.set("page", String(q.page));
  return out;
}

/** GET /api/review for a query. */
export function queueApiUrl(q: QueueQuery): string {
  const p = new URLSearchParams({ list: q.list, sort: q.sort, dir: q.dir, page: String(q.page), pageSize: String(QUEUE_PAGE_SIZE) });
  if (q.cabinetType) p.set("cabinetType", String(q.cabinetType));
  if (q.matter) p.set("matter", String(q.matter));
  if (q.confidence) p.set(q.confidence.startsWith("below") ? "maxConfidence" : "minConfidence", q.confidence.split(":")[1]);
  if (q.q.trim()) p.set("q", q.q.trim());
  return `/api/review?${p}`;
}

/** "1–100 of 336", "101–200 of 336", "3 of 3", "none of 0". */
export function pageWords(page: number, pageSize: number, shown: number, total: number): string {
  if (total === 0 || shown === 0) return `none of ${total}`;
  const first = (page - 1) * pageSize + 1;
  const last = first + shown - 1;
  if (first === 1 && last === total) return `${total} of ${total}`;
  return `${first}–${last} of ${total}`;
}
