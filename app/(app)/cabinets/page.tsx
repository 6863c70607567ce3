import type { Metadata } from "next";
import Form from "next/form";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { z } from "zod";
import { CabinetTree } from "@/components/cabinets/cabinet-tree";
import { FiledTable } from "@/components/cabinets/filed-table";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { listCabinets, listDocuments } from "@/lib/data/documents";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { MoveProvider } from "@/components/filing/move-dialog";
import { can } from "@/lib/auth/permissions";
import { RETENTION_CAUTION } from "@/lib/retention";

export const metadata: Metadata = { title: "Cabinets" };

const PAGE_SIZE = 50;
const RETENTION_FILTERS = [
  { label: "Any date", value: null },
  { label: "Due within 90 days", value: "due_soon" },
  { label: "Past due", value: "past_due" },
] as const;
const paramsSchema = z.object({
  matter: z.coerce.number().int().positive().optional().catch(undefined),
  cabinetType: z.coerce.number().int().positive().optional().catch(undefined),
  q: z.string().trim().max(200).optional().catch(undefined),
  retention: z.enum(["past_due", "due_soon"]).optional().catch(undefined),
  page: z.coerce.number().int().min(1).default(1).catch(1),
});

export default async function CabinetsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { user, allowed } = await requirePageUser("documents.read");
  if (!allowed) forbidden();
  const p = paramsSchema.parse(await searchParams);
  const [cabinets, { items, total }] = await Promise.all([
    listCabinets(user),
    listDocuments(user, { filed: true, matterId: p.matter, cabinetTypeId: p.cabinetType, q: p.q || undefined, retention: p.retention, page: p.page, pageSize: PAGE_SIZE }),
  ]);
  const movable = can(user.role, "filing.decide");
  const [types, matters] = movable ? await Promise.all([listCabinetTypes(user, true), listVisibleMatters(user)]) : [[], []];
  const chosen = cabinets.find((c) => c.matterId === p.matter && (!p.cabinetType || c.cabinetTypeId === p.cabinetType));
  const heading = chosen ? `${chosen.matter} · ${p.cabinetType ? chosen.cabinetType : "all cabinets"}` : "All filed documents";
  const href = (over: { page?: number; retention?: string | null }) => {
    const retention = over.retention === undefined ? p.retention : over.retention;
    const params = { ...(p.matter ? { matter: String(p.matter) } : {}), ...(p.cabinetType ? { cabinetType: String(p.cabinetType) } : {}), ...(p.q ? { q: p.q } : {}), ...(retention ? { retention } : {}), page: String(over.page ?? 1) };
    return `/cabinets?${new URLSearchParams(params)}`;
  };
  const link = (page: number) => href({ page });
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));

  const body = (
    <section>
      <h1 className="font-serif text-2xl">Cabinets</h1>
      <p className="mb-4 mt-1 text-sm text-ink-soft">Filed documents by matter and cabinet type. Restricted matters appear only to their team and admins.</p>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[16rem_minmax(0,1fr)]">
        <aside>
          <CabinetTree cabinets={cabinets} matterId={p.matter} cabinetTypeId={p.cabinetType} />
        </aside>
        <div className="min-w-0 space-y-3">
          <Form action="/cabinets" className="flex flex-wrap items-end gap-2 text-sm">
            {p.matter && <input type="hidden" name="matter" value={p.matter} />}
            {p.cabinetType && <input type="hidden" name="cabinetType" value={p.cabinetType} />}
            {p.retention && <input type="hidden" name="retention" value={p.retention} />}
            <label className="flex-1">
              <span className="block text-xs text-ink-soft">Search the words read from documents and their names</span>
              <input name="q" defaultValue={p.q} placeholder="e.g. lease renewal" className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1" />
            </label>
            <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm text-white">Search</button>
            {(p.q || p.matter || p.retention) && (
              <Link href="/cabinets" className="px-2 py-1.5 text-xs text-verdigris hover:underline">
                Clear
              </Link>
            )}
          </Form>
          <nav aria-label="Retention filter" className="flex flex-wrap gap-2 text-xs" data-testid="retention-filter">
            <span className="py-1 text-ink-soft">Retention:</span>
            {RETENTION_FILTERS.map((f) => (
              <Link
                key={f.label}
                href={href({ retention: f.value })}
                aria-current={p.retention === f.value || (!p.retention && f.value === null) ? "true" : undefined}
                className="rounded border border-paper-edge px-2 py-1 aria-[current]:border-verdigris aria-[current]:bg-verdigris-light hover:bg-paper-deep"
              >
                {f.label}
              </Link>
            ))}
          </nav>
          <h2 className="font-serif text-lg">
            {heading}
            {p.q ? ` — “${p.q}”` : ""}
            {p.retention ? ` — ${p.retention === "past_due" ? "past due" : "due within 90 days"}` : ""} <span className="text-sm text-ink-soft">({total})</span>
          </h2>
          {items.length === 0 ? (
            <p className="rounded border border-dashed border-paper-edge px-4 py-6 text-sm text-ink-soft">
              {p.q
                ? "Nothing filed matches these words. Try fewer or shorter words; search looks at the text read and the file name."
                : p.retention === "past_due"
                  ? "Nothing here is past its retention date. Documents past it appear here and in Disposal."
                  : p.retention === "due_soon"
                    ? "Nothing here falls due in the next 90 days."
                    : "This cabinet is empty."}
            </p>
          ) : (
            <FiledTable items={items} movable={movable} />
          )}
          {pages > 1 && (
            <nav aria-label="Pages" className="flex gap-3 text-xs">
              {p.page > 1 && <Link href={link(p.page - 1)} className="text-verdigris hover:underline">← Previous</Link>}
              <span className="text-ink-soft">Page {p.page} of {pages}</span>
              {p.page < pages && <Link href={link(p.page + 1)} className="text-verdigris hover:underline">Next →</Link>}
            </nav>
          )}
          <Notice tone="warning" title="Retention">
            {RETENTION_CAUTION}
          </Notice>
        </div>
      </div>
    </section>
  );
  // The provider holds the Move dialog and its confirmation with Undo above the page.
  return movable ? <MoveProvider types={types.map((t) => ({ id: t.id, name: t.name }))} matters={matters}>{body}</MoveProvider> : body;
}
