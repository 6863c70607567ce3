import Form from "next/form";
import Link from "next/link";
import { ACTIONS, ACTION_WORDS } from "./action-words";

export interface HistoryQuery {
  action?: string;
  document?: string;
  from?: string;
  to?: string;
  pageSize?: string;
}

const FIELD = "rounded border border-paper-edge bg-white px-2 py-1 text-sm";
export const PAGE_SIZES = [50, 100, 200] as const;

/**
 * The filters as a GET form: submitting puts them in the address (/history?action=…), so a
 * filtered view can be bookmarked or sent, and paging keeps them. Always starts on page 1.
 */
export function HistoryFilters({ query, exportHref }: { query: HistoryQuery; exportHref: string | null }) {
  return (
    <Form action="/history" className="flex flex-wrap items-end gap-3 text-xs text-ink-soft" aria-label="Filter the record">
      <label className="flex flex-col gap-0.5">
        Action
        <select name="action" defaultValue={query.action ?? ""} className={FIELD}>
          <option value="">All actions</option>
          {ACTIONS.map((a) => (
            <option key={a} value={a}>{ACTION_WORDS[a]}</option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-0.5">
        From (UTC)
        <input type="date" name="from" defaultValue={query.from ?? ""} className={FIELD} />
      </label>
      <label className="flex flex-col gap-0.5">
        To, including (UTC)
        <input type="date" name="to" defaultValue={query.to ?? ""} className={FIELD} />
      </label>
      <label className="flex flex-col gap-0.5">
        Document #
        <input type="number" name="document" min={1} step={1} inputMode="numeric" defaultValue={query.document ?? ""} className={`${FIELD} w-28`} placeholder="any" />
      </label>
      <label className="flex flex-col gap-0.5">
        Rows per page
        <select name="pageSize" defaultValue={query.pageSize ?? "100"} className={FIELD}>
          {PAGE_SIZES.map((n) => (
            <option key={n} value={n}>{n}</option>
          ))}
        </select>
      </label>
      <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark">
        Show
      </button>
      <Link href="/history" className="py-1.5 text-sm text-verdigris hover:underline">
        Clear filters
      </Link>
      {exportHref && (
        <a href={exportHref} className="ml-auto rounded border border-paper-edge bg-white/60 px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep" data-testid="history-export" download>
          Export CSV
        </a>
      )}
    </Form>
  );
}
