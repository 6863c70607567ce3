import type { Metadata } from "next";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { z } from "zod";
import { formatUtc } from "@/components/document/format";
import { PlaceHoldForm } from "@/components/records/place-hold-form";
import { ReasonDialogButton } from "@/components/records/reason-dialog-button";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { listHoldableMatters, listHoldEvents, listHolds } from "@/lib/data/holds";
import { RETENTION_CAUTION } from "@/lib/retention";

export const metadata: Metadata = { title: "Holds" };

const PAGE_SIZE = 50;
const RECENT_EVENTS = 20; // the latest places and lifts; the full record is in hold_events
const paramsSchema = z.object({
  status: z.enum(["active", "released", "all"]).default("active").catch("active"),
  document: z.coerce.number().int().positive().optional().catch(undefined),
  page: z.coerce.number().int().min(1).default(1).catch(1),
});
const STATUS_LABELS = { active: "In force", released: "Lifted", all: "All" } as const;

export default async function HoldsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { user, allowed } = await requirePageUser("holds.read");
  if (!allowed) forbidden();
  const p = paramsSchema.parse(await searchParams);
  const mayPlace = can(user.role, "holds.place");
  const [{ items, total }, matters, events] = await Promise.all([
    listHolds(user, { status: p.status, page: p.page, pageSize: PAGE_SIZE }),
    mayPlace ? listHoldableMatters(user) : Promise.resolve([]),
    listHoldEvents(user, RECENT_EVENTS),
  ]);
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const link = (o: { status?: string; page?: number }) => `/holds?${new URLSearchParams({ status: o.status ?? p.status, page: String(o.page ?? 1) })}`;

  return (
    <section className="space-y-4">
      <div>
        <h1 className="font-serif text-2xl">Holds</h1>
        <p className="mt-1 text-sm text-ink-soft">
          A legal hold stops every document it covers from being proposed for disposal or destroyed, whatever its retention date. Partners on a matter and admins place and lift holds.
        </p>
      </div>
      <Notice tone="warning" title="Retention">
        {RETENTION_CAUTION}
      </Notice>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-3">
          <nav aria-label="Hold status" className="flex gap-2 text-xs">
            {(Object.keys(STATUS_LABELS) as (keyof typeof STATUS_LABELS)[]).map((s) => (
              <Link key={s} href={link({ status: s })} aria-current={p.status === s ? "true" : undefined} className="rounded border border-paper-edge px-2 py-1 aria-[current]:border-verdigris aria-[current]:bg-verdigris-light">
                {STATUS_LABELS[s]}
              </Link>
            ))}
            <span className="py-1 text-ink-soft">({total})</span>
          </nav>
          {items.length === 0 ? (
            <p className="rounded border border-dashed border-paper-edge px-4 py-6 text-sm text-ink-soft">
              {p.status === "active" ? `No hold is in force on anything you can see.${mayPlace ? " Place one with the form when a case, an audit or a request means records must be kept." : ""}` : "No holds here."}
            </p>
          ) : (
            <div className="overflow-x-auto">
            <table className="w-full border-collapse text-sm" data-testid="holds-table">
              <thead className="sticky top-0 bg-paper text-left text-xs text-ink-soft">
                <tr>
                  <th className="py-1 pr-2 font-medium">Hold</th>
                  <th className="py-1 pr-2 font-medium">On</th>
                  <th className="py-1 pr-2 font-medium">Reason · reference</th>
                  <th className="py-1 pr-2 font-medium">Placed</th>
                  <th className="py-1 pr-2 font-medium">Lifted</th>
                </tr>
              </thead>
              <tbody>
                {items.map((h) => (
                  <tr key={h.id} className="border-t border-paper-edge align-top" data-testid="hold-row">
                    <td className="py-1 pr-2">
                      <span className="font-mono text-xs">#{h.id}</span>{" "}
                      {h.releasedAt ? <span className="text-xs text-ink-soft">lifted</span> : <span className="whitespace-nowrap rounded border border-brick/40 bg-brick-light px-1 text-xs font-medium text-brick">Legal hold in force</span>}
                    </td>
                    <td className="py-1 pr-2">
                      {h.scope === "matter" ? (
                        <>
                          matter <span className="font-mono text-xs">{h.matter}</span> <span className="text-xs text-ink-soft">{h.matterTitle}</span>
                        </>
                      ) : (
                        <Link href={`/documents/${h.documentId}`} className="text-verdigris hover:underline">
                          {h.documentName}
                        </Link>
                      )}
                    </td>
                    <td className="py-1 pr-2">
                      {h.reason} · <span className="font-mono text-xs">{h.reference}</span>
                    </td>
                    <td className="py-1 pr-2 text-xs">
                      {h.placedBy}, <span className="font-mono">{formatUtc(h.placedAt)}</span>
                    </td>
                    <td className="py-1 pr-2 text-xs">
                      {h.releasedAt ? (
                        <>
                          {h.releasedBy}, <span className="font-mono">{formatUtc(h.releasedAt)}</span>: {h.releaseReason}
                        </>
                      ) : mayPlace ? (
                        <ReasonDialogButton label="Lift…" title={`Lift hold #${h.id}?`} url={`/api/holds/${h.id}/release`} confirmLabel="Lift the hold" reasonLabel="Why the hold can be lifted" testId="lift-hold">
                          <p>Once lifted, the documents it covered can fall due again and be proposed for disposal. The lift is recorded with your name and reason.</p>
                        </ReasonDialogButton>
                      ) : (
                        "–"
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            </div>
          )}
          {pages > 1 && (
            <nav aria-label="Pages" className="flex gap-3 text-xs">
              {p.page > 1 && <Link href={link({ page: p.page - 1 })} className="text-verdigris hover:underline">← Previous</Link>}
              <span className="text-ink-soft">Page {p.page} of {pages}</span>
              {p.page < pages && <Link href={link({ page: p.page + 1 })} className="text-verdigris hover:underline">Next →</Link>}
            </nav>
          )}
          <h2 className="pt-2 font-serif text-lg">The record of holds</h2>
          {events.length === 0 ? (
            <p className="text-sm text-ink-soft">No hold has been placed or lifted yet.</p>
          ) : (
            <ol className="space-y-0.5 text-xs" data-testid="hold-events">
              {events.map((e) => (
                <li key={e.id}>
                  <span className="font-mono">{formatUtc(e.at)}</span> — hold #{e.holdId} {e.action === "placed" ? "placed" : "lifted"} by {e.user}: {e.reason}
                  {e.reference ? ` (ref. ${e.reference})` : ""}
                </li>
              ))}
            </ol>
          )}
        </div>
        {mayPlace && (
          <aside className="lg:sticky lg:top-6 lg:self-start">
            <PlaceHoldForm matters={matters} documentId={p.document} />
          </aside>
        )}
      </div>
    </section>
  );
}
