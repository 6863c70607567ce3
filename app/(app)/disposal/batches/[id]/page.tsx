import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { formatUtc } from "@/components/document/format";
import { HoldBadge } from "@/components/records/hold-badge";
import { ReasonDialogButton } from "@/components/records/reason-dialog-button";
import { Notice } from "@/components/ui/notice";
import { requirePageUser } from "@/lib/data/current-user";
import { getBatch, whyNotApprover, type BatchDetail } from "@/lib/data/disposal-batches";
import { AppError } from "@/lib/errors";
import { RETENTION_CAUTION } from "@/lib/retention";
import { batchIdSchema } from "@/lib/validations/records";

export const metadata: Metadata = { title: "Disposal batch" };

const OUTCOME_WORDS = { proposed: "proposed", disposed: "destroyed", kept_hold: "kept: legal hold", kept_not_due: "kept: no longer due", rejected: "kept: batch rejected" } as const;

async function loadBatch(user: Parameters<typeof getBatch>[0], id: number): Promise<BatchDetail> {
  try {
    return await getBatch(user, id);
  } catch (e) {
    if (e instanceof AppError && e.status === 404) notFound();
    if (e instanceof AppError && e.status === 403) forbidden();
    throw e;
  }
}

export default async function BatchPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, allowed } = await requirePageUser("disposal.read");
  if (!allowed) forbidden();
  const id = batchIdSchema.safeParse((await params).id);
  if (!id.success) notFound();
  const batch = await loadBatch(user, id.data);
  const why = batch.status === "proposed" ? await whyNotApprover(user, batch) : null;
  const mayDecide = batch.status === "proposed" && why === null;
  const mayWithdraw = batch.status === "proposed" && batch.proposedById === user.id;
  const heldNow = batch.items.filter((i) => i.outcome === "proposed" && i.heldNow).length;

  return (
    <section className="space-y-4">
      <nav className="text-xs">
        <Link href="/disposal" className="text-verdigris hover:underline">← Disposal</Link>
      </nav>
      <h1 className="font-serif text-2xl">Disposal batch #{batch.id}</h1>
      <Notice tone="warning" title="Before anything is destroyed">
        {RETENTION_CAUTION}
      </Notice>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-2 text-sm sm:grid-cols-4">
        <div><dt className="text-xs text-ink-faint">Status</dt><dd data-testid="batch-status">{batch.status === "proposed" ? "Waiting for approval" : batch.status === "approved" ? "Approved and carried out" : "Rejected"}</dd></div>
        <div><dt className="text-xs text-ink-faint">Proposed by</dt><dd>{batch.proposedBy}, <span className="font-mono text-xs">{formatUtc(batch.proposedAt)}</span></dd></div>
        <div><dt className="text-xs text-ink-faint">Decided by</dt><dd>{batch.decidedBy ? <>{batch.decidedBy}, <span className="font-mono text-xs">{formatUtc(batch.decidedAt!)}</span></> : "–"}</dd></div>
        <div><dt className="text-xs text-ink-faint">Matters</dt><dd className="font-mono text-xs">{batch.matters.map((m) => m.number).join(", ") || "–"}</dd></div>
        <div className="col-span-full"><dt className="text-xs text-ink-faint">Note</dt><dd>{batch.note}</dd></div>
        {batch.decisionReason && <div className="col-span-full"><dt className="text-xs text-ink-faint">Why rejected</dt><dd>{batch.decisionReason}</dd></div>}
      </dl>

      {batch.status === "proposed" && (
        <div className="flex flex-wrap items-center gap-3 rounded border border-paper-edge bg-white/60 p-3 text-sm">
          {heldNow > 0 && <p className="basis-full text-brick">{heldNow} of these documents are now under a legal hold: approval keeps them and destroys only the rest.</p>}
          {mayDecide ? (
            <>
              <ReasonDialogButton label="Approve and destroy…" title={`Destroy the documents of batch #${batch.id}?`} url={`/api/disposal/batches/${batch.id}/approve`} confirmLabel="Approve: destroy them" variant="danger" testId="approve-batch">
                <p>The originals are deleted from storage and their text cleared. This cannot be undone. Each document keeps a tombstone, and a certificate of disposal is made.</p>
                <p className="text-amber">{RETENTION_CAUTION}</p>
              </ReasonDialogButton>
              <ReasonDialogButton label="Reject…" title={`Reject batch #${batch.id}?`} url={`/api/disposal/batches/${batch.id}/reject`} confirmLabel="Reject the batch" reasonLabel="Why these documents stay" testId="reject-batch">
                <p>Nothing is destroyed; the documents can be proposed again later.</p>
              </ReasonDialogButton>
            </>
          ) : (
            <p className="text-ink-soft" data-testid="why-not-approver">{why}</p>
          )}
          {mayWithdraw && (
            <ReasonDialogButton label="Withdraw…" title={`Withdraw batch #${batch.id}?`} url={`/api/disposal/batches/${batch.id}/reject`} confirmLabel="Withdraw" reasonLabel="Why you withdraw it" testId="withdraw-batch">
              <p>Nothing is destroyed.</p>
            </ReasonDialogButton>
          )}
        </div>
      )}
      {batch.status === "approved" && (
        <p className="text-sm" data-testid="certificate-links">
          Certificate of disposal:{" "}
          <a href={`/api/disposal/batches/${batch.id}/certificate?format=pdf`} className="text-verdigris hover:underline" data-testid="certificate-pdf">PDF</a> ·{" "}
          <a href={`/api/disposal/batches/${batch.id}/certificate?format=csv`} className="text-verdigris hover:underline">CSV</a>
        </p>
      )}

      <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" data-testid="batch-items">
        <thead className="sticky top-0 bg-paper text-left text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-2 font-medium">Document</th>
            <th className="py-1 pr-2 font-medium">Matter</th>
            <th className="py-1 pr-2 font-medium">Cabinet type · rule</th>
            <th className="py-1 pr-2 font-medium">Retention date</th>
            <th className="py-1 pr-2 font-medium">Outcome</th>
          </tr>
        </thead>
        <tbody>
          {batch.items.map((i) => (
            <tr key={i.documentId} className="border-t border-paper-edge align-top">
              <td className="max-w-[20rem] py-1 pr-2">
                <div className="flex min-w-0 items-center">
                  <Link href={`/documents/${i.documentId}`} className="truncate text-verdigris hover:underline" title={i.name}>{i.name}</Link>
                  {i.heldNow && <HoldBadge className="shrink-0" />}
                </div>
                <span className="font-mono text-[0.7rem] text-ink-faint">{i.sha256.slice(0, 16)}…</span>
              </td>
              <td className="py-1 pr-2 font-mono text-xs">{i.matter ?? "–"}</td>
              <td className="py-1 pr-2 text-xs">{i.cabinetType ?? "–"} · {i.rule}</td>
              <td className="py-1 pr-2 font-mono text-xs">{i.dueOn}</td>
              <td className={`py-1 pr-2 text-xs ${i.outcome === "kept_hold" ? "text-brick" : ""}`}>{OUTCOME_WORDS[i.outcome]}</td>
            </tr>
          ))}
        </tbody>
      </table>
      </div>
    </section>
  );
}
