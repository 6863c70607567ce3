import type { Metadata } from "next";
import { forbidden, notFound } from "next/navigation";
import { DocumentBreadcrumb } from "@/components/document/document-breadcrumb";
import { DocumentHeader } from "@/components/document/document-header";
import { MoveButton, MoveProvider } from "@/components/filing/move-dialog";
import { listCabinetTypes, listVisibleMatters } from "@/lib/data/catalog";
import { documentState, lastPlacement } from "@/components/document/document-state";
import { SuggestionPanel } from "@/components/document/suggestion-panel";
import { TextPanel } from "@/components/document/text-panel";
import { PagePreview } from "@/components/document/page-preview";
import { Timeline } from "@/components/document/timeline";
import { can } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/data/current-user";
import { getDocument } from "@/lib/data/documents";
import { getLatestSuggestion, listDocumentTimeline } from "@/lib/data/filing-record";
import { findDisposalOf } from "@/lib/data/disposal-batches";
import { listHoldsOnDocument } from "@/lib/data/holds";
import { DocumentRecords } from "@/components/records/document-records";
import { AppError } from "@/lib/errors";
import { documentIdSchema } from "@/lib/validations/documents";

interface DocumentPageProps {
  params: Promise<{ id: string }>;
}

/** Titled by the file name (behind the same wall check as the page: a walled one is "Not found"). */
export async function generateMetadata({ params }: DocumentPageProps): Promise<Metadata> {
  const { user, allowed } = await requirePageUser("documents.read");
  const id = documentIdSchema.safeParse((await params).id);
  if (!allowed || !id.success) return { title: "Document" };
  const name = await getDocument(user, id.data).then((d) => d.name, () => null);
  return { title: name ?? "Not found" };
}

/** The document behind the ethical wall check: a missing one is a 404, a walled one a 403. */
async function loadDocument(user: Parameters<typeof getDocument>[0], id: number) {
  try {
    return await getDocument(user, id);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    if (e instanceof AppError && e.status === 403) forbidden();
    throw e;
  }
}

export default async function DocumentPage({ params }: DocumentPageProps) {
  const { user, allowed } = await requirePageUser("documents.read");
  if (!allowed) forbidden();
  const id = documentIdSchema.safeParse((await params).id);
  if (!id.success) notFound();
  const document = await loadDocument(user, id.data); // checks access before anything else is read
  const [suggestion, timeline, holds, disposal] = await Promise.all([
    getLatestSuggestion(user, id.data),
    listDocumentTimeline(user, id.data),
    listHoldsOnDocument(id.data),
    document.disposedAt ? findDisposalOf(id.data) : null,
  ]);
  const state = documentState(document, suggestion, timeline);
  const movable = can(user.role, "filing.decide") && Boolean(document.filedAt) && !document.disposedAt;
  const [types, matters] = movable ? await Promise.all([listCabinetTypes(user, true), listVisibleMatters(user)]) : [[], []];

  const page = (
    <article className="space-y-6">
      <DocumentBreadcrumb document={document} historyLink={can(user.role, "history.read")} />
      <DocumentHeader
        document={document}
        state={state}
        placement={lastPlacement(timeline)}
        move={movable ? <MoveButton doc={{ id: document.id, name: document.name, cabinetTypeId: document.cabinetTypeId, matterId: document.matterId }} className="ml-2 rounded border border-paper-edge bg-white/70 px-2 py-0.5 text-xs font-medium text-verdigris hover:bg-paper-deep" /> : null}
      />
      <DocumentRecords document={document} holds={holds} canPlaceHold={can(user.role, "holds.place")} disposal={disposal} />
      {/* A tombstone's text was cleared with its original; the notice above says so. */}
      {!document.disposedAt && (
        <div className="grid gap-6 lg:grid-cols-2">
          <PagePreview documentId={document.id} name={document.name} pageCount={document.pageCount} />
          <TextPanel text={document.text} truncated={document.textTruncated} charCount={document.charCount} reading={document.status === "reading"} terms={suggestion?.why.map((w) => w.term) ?? []} />
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-6">
          <Timeline events={timeline} />
        </div>
        <aside className="lg:sticky lg:top-6 lg:self-start">
          <SuggestionPanel suggestion={suggestion} state={state} />
        </aside>
      </div>
    </article>
  );
  return movable ? <MoveProvider types={types.map((t) => ({ id: t.id, name: t.name }))} matters={matters}>{page}</MoveProvider> : page;
}
