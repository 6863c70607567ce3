import type { Metadata } from "next";
import Form from "next/form";
import Link from "next/link";
import { forbidden } from "next/navigation";
import { CabinetTypeForm } from "@/components/setup/cabinet-type-form";
import { EMPTY_TYPE } from "@/components/setup/form-values";
import { CabinetTypesTable, type TypeRow } from "@/components/setup/cabinet-types-table";
import { INPUT } from "@/components/setup/field";
import { learningStatus } from "@/components/setup/learning-status";
import { hrefWith, matchesQuery, pick, readParams, sortBy, type SearchParams } from "@/components/setup/list-query";
import { RetrainOffer } from "@/components/setup/retrain-offer";
import { SetupHeader } from "@/components/setup/setup-header";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { findCurrentModel } from "@/lib/data/models";
import { getOfficeSettings } from "@/lib/data/settings";
import { listCabinetTypesWithCounts } from "@/lib/data/setup-cabinet-types";

export const metadata: Metadata = { title: "Cabinet types · Setup" };

const PATH = "/setup/cabinet-types";
const SORTS = ["name", "retention", "filed", "learning"] as const;
const SHOWS = ["active", "retired", "all"] as const;
const DONE: Record<string, string> = {
  created: "added. It ranks from its description and keywords at once.",
  saved: "saved.",
  retired: "retired.",
  restored: "restored: it is back in the pickers and suggestions.",
  merged: "merged; its documents moved and it is retired.",
};

export default async function CabinetTypesPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const { user, allowed } = await requirePageUser("setup.manage");
  if (!allowed) forbidden();
  const params = readParams(await searchParams);
  const [types, settings, current] = await Promise.all([listCabinetTypesWithCounts(), getOfficeSettings(user), findCurrentModel()]);
  const learned = new Set((current?.classList ?? []).map(Number));
  const sort = pick(params.sort, SORTS, "name");
  const dir = params.dir === "desc" ? "desc" : "asc";
  const show = pick(params.show, SHOWS, "active");
  const rows: TypeRow[] = types.map((t) => ({ ...t, learned: learned.has(t.id) }));
  const shown = rows.filter((t) => (show === "all" || (show === "active") === t.active) && matchesQuery(params.q, [t.name, t.description, ...t.keywords]));
  const key = {
    name: (t: TypeRow) => t.name,
    retention: (t: TypeRow) => (t.retentionTrigger === "permanent" ? Number.MAX_SAFE_INTEGER : (t.retentionYears ?? 0)),
    filed: (t: TypeRow) => t.filedCount,
    learning: (t: TypeRow) => learningStatus({ ...t, minExamples: settings.minExamplesPerType }).needed,
  }[sort];
  const sorted = sortBy(shown, key, dir);
  const editing = params.edit === "new" ? "new" : types.find((t) => String(t.id) === params.edit);
  const listParams = Object.fromEntries(Object.entries(params).filter(([k]) => !["edit", "done", "name"].includes(k)));
  const done = params.done && DONE[params.done] ? `“${params.name ?? "The cabinet type"}” ${DONE[params.done]}` : null;

  return (
    <section className="space-y-4">
      <SetupHeader title="Cabinet types" blurb={`The classes Foldwright files into. A new type ranks from its description and keywords at once; the model learns it from ${settings.minExamplesPerType} filed examples on (the office's setting on Models).`}>
        <Link href={hrefWith(PATH, listParams, { edit: "new" })} className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark" data-testid="add-cabinet-type" scroll={false}>
          Add cabinet type
        </Link>
      </SetupHeader>
      {done && (params.done === "retired" || params.done === "merged" ? <RetrainOffer what={done} /> : <Notice>{done}</Notice>)}
      <Form action={PATH} className="flex flex-wrap items-end gap-3 text-xs text-ink-soft" aria-label="Filter cabinet types">
        <label className="flex flex-col gap-0.5">
          Search
          <input name="q" defaultValue={params.q ?? ""} placeholder="name, description or keyword" className={`${INPUT} w-64`} />
        </label>
        <label className="flex flex-col gap-0.5">
          Show
          <select name="show" defaultValue={show} className={INPUT}>
            <option value="active">Active types</option>
            <option value="retired">Retired types</option>
            <option value="all">All types</option>
          </select>
        </label>
        {params.sort && <input type="hidden" name="sort" value={sort} />}
        {params.dir && <input type="hidden" name="dir" value={dir} />}
        <button type="submit" className="rounded bg-verdigris px-3 py-1.5 text-sm font-medium text-white hover:bg-verdigris-dark">Show</button>
        <Link href={PATH} className="py-1.5 text-sm text-verdigris hover:underline">Clear</Link>
      </Form>
      <div className="flex flex-col gap-4 xl:flex-row xl:items-start">
        <div className="min-w-0 flex-1">
          {sorted.length === 0 ? (
            <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft" data-testid="cabinet-types-empty">
              {types.length === 0
                ? "No cabinet types yet. Add the first one: a name, a description of what belongs in it, a few keywords and its retention."
                : "No cabinet type matches these filters. Clear the search, or show retired types too."}
            </p>
          ) : (
            <CabinetTypesTable rows={sorted} activeTypes={types.filter((t) => t.active).map(({ id, name }) => ({ id, name }))} params={listParams} sort={sort} dir={dir} minExamples={settings.minExamplesPerType} />
          )}
        </div>
        {editing && (
          <aside className="w-full shrink-0 rounded border border-paper-edge bg-white/70 p-4 xl:w-96" aria-label="Cabinet type details">
            <CabinetTypeForm
              key={editing === "new" ? "new" : editing.id}
              id={editing === "new" ? undefined : editing.id}
              initial={
                editing === "new"
                  ? EMPTY_TYPE
                  : { name: editing.name, description: editing.description, keywords: editing.keywords.join(", "), retentionYears: editing.retentionYears === null ? "" : String(editing.retentionYears), retentionTrigger: editing.retentionTrigger, retentionSource: editing.retentionSource }
              }
            />
          </aside>
        )}
      </div>
      {params.edit && !editing && <Notice tone="warning">That cabinet type was not found. Pick one from the list.</Notice>}
    </section>
  );
}
