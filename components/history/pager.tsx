import Link from "next/link";

interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  /** The address of another page with the same filters. */
  hrefFor: (page: number) => string;
}

const LINK = "rounded border border-paper-edge bg-white/60 px-2 py-1 text-ink hover:bg-paper-deep";

export function Pager({ page, pageSize, total, hrefFor }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages of the record" className="flex items-center gap-2 text-xs text-ink-soft">
      <p data-testid="history-count">
        {first}–{last} of {total.toLocaleString("en-US")} events · page {page} of {pages}
      </p>
      <span className="ml-auto" />
      {page > 1 ? <Link href={hrefFor(1)} className={LINK}>First</Link> : null}
      {page > 1 ? <Link href={hrefFor(page - 1)} className={LINK} rel="prev">Previous</Link> : null}
      {page < pages ? <Link href={hrefFor(page + 1)} className={LINK} rel="next">Next</Link> : null}
      {page < pages ? <Link href={hrefFor(pages)} className={LINK}>Last</Link> : null}
    </nav>
  );
}
