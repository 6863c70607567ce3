import type { Metadata } from "next";
import { forbidden } from "next/navigation";
import { EventsTable } from "@/components/history/events-table";
import { HistoryFilters, type HistoryQuery } from "@/components/history/history-filters";
import { HistoryTabs } from "@/components/history/history-tabs";
import { Pager } from "@/components/history/pager";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { listFilingEvents } from "@/lib/data/filing-record";
import { eventsSchema } from "@/lib/validations/filing";

export const metadata: Metadata = { title: "History" };

type SearchParams = Record<string, string | string[] | undefined>;

/** The CSV export's row cap: the route's largest page. */
const EXPORT_ROWS = 10_000;

/** The day after a YYYY-MM-DD date: the record's `to` is exclusive, the screen's "to" includes the day. */
function dayAfter(date: string): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + 1);
  return d.toISOString().slice(0, 10);
}

/** 2026-02-30 has the right shape but is no day: the database would not compare it as a date. */
function isCalendarDate(date: string): boolean {
  const d = new Date(`${date}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === date;
}

/** Single, non-empty values only: an empty form field means "any". */
function readQuery(sp: SearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(sp)) {
    const s = Array.isArray(v) ? v[0] : v;
    if (s !== undefined && s.trim() !== "") out[k] = s.trim();
  }
  return out;
}

export default async function HistoryPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const { user, allowed } = await requirePageUser("history.read");
  if (!allowed) forbidden();
  const raw = readQuery(await searchParams);
  const query: HistoryQuery = { action: raw.action, document: raw.document, from: raw.from, to: raw.to, pageSize: raw.pageSize };
  const parsed = eventsSchema
    .refine((f) => [f.from, f.to].every((d) => d === undefined || isCalendarDate(d)), { message: "A date in the filters does not exist on the calendar." })
    .safeParse({ ...raw, format: undefined });

  const filters = new URLSearchParams();
  for (const key of ["action", "document", "from", "to", "pageSize"] as const) if (query[key]) filters.set(key, query[key]!);
  const hrefFor = (page: number) => {
    const p = new URLSearchParams(filters);
    if (page > 1) p.set("page", String(page));
    return `/history${p.size ? `?${p}` : ""}`;
  };
  const api = new URLSearchParams();
  if (parsed.success) {
    const f = parsed.data;
    if (f.action) api.set("action", f.action);
    if (f.document) api.set("document", String(f.document));
    if (f.from) api.set("from", f.from);
    if (f.to) api.set("to", dayAfter(f.to));
  }
  const exportHref = `/api/filing-events?${api}${api.size ? "&" : ""}format=csv&pageSize=${EXPORT_ROWS}`;

  const result = parsed.success
    ? await listFilingEvents(user, {
        action: parsed.data.action,
        documentId: parsed.data.document,
        from: parsed.data.from,
        to: parsed.data.to ? dayAfter(parsed.data.to) : undefined,
        page: parsed.data.page,
        pageSize: parsed.data.pageSize,
      })
    : null;
  const filtered = filters.size > (query.pageSize ? 1 : 0);

  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">History</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          The filing record: every suggestion, filing, refile, auto-filing and spot-check confirmation, newest first. Entries are only ever added,
          never changed or removed. Times are in UTC.
        </p>
      </div>
      <HistoryTabs active="/history" />
      <HistoryFilters query={query} exportHref={parsed.success ? exportHref : null} />
      {!parsed.success && (
        <Notice tone="error" title="These filters cannot be used">
          {parsed.error.issues[0]?.message ?? "Check the filters."} Change them above, or clear them to see the whole record.
        </Notice>
      )}
      {result && result.total === 0 && (
        <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft" data-testid="history-empty">
          {filtered
            ? "No filing events match these filters. Widen the dates, pick another action, or clear the filters."
            : "Nothing on the record yet. Events appear here as soon as Foldwright suggests a place for a document read at Intake, and each time someone files, refiles or confirms one."}
        </p>
      )}
      {result && result.total > 0 && (
        <>
          <Pager page={parsed.data!.page} pageSize={parsed.data!.pageSize} total={result.total} hrefFor={hrefFor} />
          {result.items.length > 0 ? (
            <EventsTable items={result.items} />
          ) : (
            <p className="text-sm text-ink-soft">This page is past the end of the record. Go back to the first page.</p>
          )}
          {result.total > EXPORT_ROWS && (
            <p className="text-xs text-ink-faint">
              The CSV export holds the newest {EXPORT_ROWS.toLocaleString("en-US")} matching events; narrow the dates to export older ones.
            </p>
          )}
        </>
      )}
    </section>
  );
}
