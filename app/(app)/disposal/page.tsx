import type { Metadata } from "next";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { z } from "zod";
import { BatchList } from "@/components/records/batch-list";
import { DueTable } from "@/components/records/due-table";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { listDue } from "@/lib/data/disposal";
import { listBatches } from "@/lib/data/disposal-batches";
import { RETENTION_CAUTION } from "@/lib/retention";

export const metadata: Metadata = { title: "Disposal" };

const PAGE_SIZE = 100;
const DECIDED_SHOWN = 20; // the latest decided batches; older ones stay reachable by number
const paramsSchema = z.object({ page: z.coerce.number().int().min(1).default(1).catch(1) });

export default async function DisposalPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { user, allowed } = await requirePageUser("disposal.read");
  if (!allowed) forbidden();
  const p = paramsSchema.parse(await searchParams);
  const [due, waiting, decided] = await Promise.all([
    listDue(user, { page: p.page, pageSize: PAGE_SIZE }),
    listBatches(user, { status: "proposed", page: 1, pageSize: 100 }),
    listBatches(user, { page: 1, pageSize: DECIDED_SHOWN }),
  ]);
  const pages = Math.max(1, Math.ceil(due.total / PAGE_SIZE));
  const canPropose = can(user.role, "disposal.propose");

  return (
    <section className="space-y-5">
      <div>
        <h1 className="font-serif text-2xl">Disposal</h1>
        <p className="mt-1 text-sm text-ink-soft">
          Documents past their retention date and under no legal hold. An admin proposes a batch; a partner on each matter involved, or another admin, approves it. Only then are the originals destroyed.
        </p>
      </div>
      <Notice tone="warning" title="Before anything is destroyed">
        {RETENTION_CAUTION}
      </Notice>

      <div className="space-y-2">
        <h2 className="font-serif text-lg">Waiting for a decision</h2>
        <BatchList batches={waiting.items} empty="No batch waits for approval." />
      </div>

      <div className="space-y-2">
        <h2 className="font-serif text-lg">
          Past their retention date <span className="text-sm text-ink-soft">({due.total})</span>
        </h2>
        {due.items.length === 0 ? (
          <p className="rounded border border-dashed border-paper-edge px-4 py-6 text-sm text-ink-soft">
            Nothing you can see is past its retention date and free of holds. Documents appear here on the day their cabinet type&apos;s rule lets them go; Cabinets shows what falls due within 90 days.
          </p>
        ) : (
          <DueTable items={due.items} canPropose={canPropose} caution={RETENTION_CAUTION} />
        )}
        {pages > 1 && (
          <nav aria-label="Pages" className="flex gap-3 text-xs">
            {p.page > 1 && <Link href={`/disposal?page=${p.page - 1}`} className="text-verdigris hover:underline">← Previous</Link>}
            <span className="text-ink-soft">Page {p.page} of {pages}</span>
            {p.page < pages && <Link href={`/disposal?page=${p.page + 1}`} className="text-verdigris hover:underline">Next →</Link>}
          </nav>
        )}
      </div>

      <div className="space-y-2">
        <h2 className="font-serif text-lg">Latest batches</h2>
        <BatchList batches={decided.items.filter((b) => b.status !== "proposed")} empty="No batch has been decided yet." />
      </div>
    </section>
  );
}
