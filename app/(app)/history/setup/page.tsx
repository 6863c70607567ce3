import type { Metadata } from "next";
import Form from "next/form";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { HistoryTabs } from "@/components/history/history-tabs";
import { Pager } from "@/components/history/pager";
import { ENTITY_WORDS, SetupEventsTable } from "@/components/history/setup-events-table";
import { readParams, type SearchParams } from "@/components/setup/list-query";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { listSetupEvents } from "@/lib/data/setup-events";
import { SETUP_EVENT_ENTITIES, setupEventsQuerySchema } from "@/lib/validations/setup";

export const metadata: Metadata = { title: "Setup record · History" };

/** The CSV export's row cap: the route's largest page. */
const EXPORT_ROWS = 10_000;
const FIELD = "rounded border border-paper-edge bg-white px-2 py-1 text-sm";

export default async function SetupRecordPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const { user, allowed } = await requirePageUser("history.read");
  if (!allowed) forbidden();
  const raw = readParams(await searchParams);
  const parsed = setupEventsQuerySchema.safeParse({ ...raw, format: undefined });
  const result = parsed.success ? await listSetupEvents(user, parsed.data) : null;
  const filters = new URLSearchParams();
  if (parsed.success && parsed.data.entity) filters.set("entity", parsed.data.entity);
  const hrefFor = (page: number) => {
    const p = new URLSearchParams(filters);
    if (page > 1) p.set("page", String(page));
    return `/history/setup${p.size ? `?${p}` : ""}`;
  };
  const exportHref = `/api/setup-events?${filters}${filters.size ? "&" : ""}format=csv&pageSize=${EXPORT_ROWS}`;

  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">History</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          The setup record: every cabinet type, client, matter and team change, who made it and what it was before and after, newest first. Entries
          are only ever added. Each keeps the names things had at the time. Times are in UTC.
        </p>
      </div>
      <HistoryTabs active="/history/setup" />
      <Form action="/history/setup" className="flex flex-wrap items-end gap-3 text-xs text-ink-soft" aria-label="Filter the setup record">
        <label className="flex flex-col gap-0.5">
          About
          <select name="entity" defaultValue={raw.entity ?? ""} className={FIELD}>
            <option value="">Everything</option>
            {SETUP_EVENT_ENTITIES.map((e) => <option key={e} value={e}>{ENTITY_WORDS[e]}</option>)}
          </select>
        </label>
        <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark">Show</button>
        <Link href="/history/setup" className="py-1.5 text-sm text-verdigris hover:underline">Clear</Link>
        <a href={exportHref} className="ml-auto rounded border border-paper-edge bg-white/60 px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep" data-testid="setup-record-export" download>
          Export CSV
        </a>
      </Form>
      {!parsed.success && (
        <Notice tone="error" title="These filters cannot be used">
          {parsed.error.issues[0]?.message ?? "Check the filters."} Clear them to see the whole record.
        </Notice>
      )}
      {result && result.total === 0 && (
        <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft" data-testid="setup-record-empty">
          {filters.size ? "Nothing on the setup record about this. Choose Everything to see all of it." : "Nothing on the setup record yet. Changes made under Setup appear here as they happen."}
        </p>
      )}
      {result && result.total > 0 && (
        <>
          <Pager page={parsed.data!.page} pageSize={parsed.data!.pageSize} total={result.total} hrefFor={hrefFor} />
          <SetupEventsTable items={result.items} />
        </>
      )}
    </section>
  );
}
