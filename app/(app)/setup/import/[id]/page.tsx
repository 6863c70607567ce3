import type { Metadata } from "next";
import { forbidden, notFound } from "next/navigation";
import { SetupHeader } from "@/components/setup/setup-header";
import { ImportBoard } from "@/components/imports/import-board";
import { AppError } from "@/lib/errors";
import { requirePageUser } from "@/lib/data/current-user";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { getImport } from "@/lib/data/imports";

export const metadata: Metadata = { title: "Import" };

export default async function ImportDetailPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const view = await getImport(user, id).catch((e) => {
    if (e instanceof AppError && e.status === 404) notFound();
    throw e;
  });
  const [types, matters] = await Promise.all([listCabinetTypes(user, true), listVisibleMatters(user)]);
  return (
    <section className="max-w-5xl space-y-4">
      <SetupHeader title={`Import #${view.id}`} blurb="Where each folder goes, then each file's progress and fate. You can leave this page and come back: the import goes on." />
      <ImportBoard
        initial={view}
        types={types.map((t) => ({ id: t.id, label: t.name }))}
        matters={matters.map((m) => ({ id: m.id, label: `${m.number} — ${m.title}` }))}
      />
    </section>
  );
}
