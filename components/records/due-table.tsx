"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/models/confirm-dialog";
import { requestJson } from "@/components/models/request";
import type { DueDocument } from "@/lib/data/disposal";

interface DueTableProps {
  items: DueDocument[];
  canPropose: boolean;
  caution: string;
}

/** Past-due documents; an admin ticks some, writes a note and proposes them as one batch. */
export function DueTable({ items, canPropose, caution }: DueTableProps) {
  const router = useRouter();
  const free = items.filter((d) => d.inBatchId === null);
  const [picked, setPicked] = useState<Set<number>>(new Set());
  const [note, setNote] = useState("");
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const toggle = (id: number) => setPicked((s) => { const n = new Set(s); if (n.has(id)) n.delete(id); else n.add(id); return n; });
  const allPicked = free.length > 0 && free.every((d) => picked.has(d.id));

  async function propose() {
    setBusy(true);
    setError(null);
    try {
      const { batch } = await requestJson<{ batch: { id: number } }>("/api/disposal/batches", { method: "POST", body: JSON.stringify({ documentIds: [...picked], note }) });
      router.push(`/disposal/batches/${batch.id}`);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  }

  return (
    <div className="space-y-3">
      <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" data-testid="due-table">
        <thead className="sticky top-0 bg-paper text-left text-xs text-ink-soft">
          <tr>
            {canPropose && (
              <th className="w-8 py-1 pr-2">
                <input type="checkbox" aria-label="Pick every document on this page" checked={allPicked} onChange={() => setPicked(allPicked ? new Set() : new Set(free.map((d) => d.id)))} />
              </th>
            )}
            <th className="py-1 pr-2 font-medium">Document</th>
            <th className="py-1 pr-2 font-medium">Matter</th>
            <th className="py-1 pr-2 font-medium">Cabinet type · rule</th>
            <th className="py-1 pr-2 font-medium">Filed (UTC)</th>
            <th className="py-1 pr-2 font-medium">Retention date</th>
          </tr>
        </thead>
        <tbody>
          {items.map((d) => (
            <tr key={d.id} className="border-t border-paper-edge align-top" data-testid="due-row">
              {canPropose && (
                <td className="py-1 pr-2">
                  {d.inBatchId === null ? (
                    <input type="checkbox" aria-label={`Pick ${d.name}`} checked={picked.has(d.id)} onChange={() => toggle(d.id)} data-testid={`pick-${d.id}`} />
                  ) : null}
                </td>
              )}
              <td className="max-w-[20rem] truncate py-1 pr-2">
                <Link href={`/documents/${d.id}`} className="text-verdigris hover:underline" title={d.name}>
                  {d.name}
                </Link>
                {d.inBatchId !== null && (
                  <Link href={`/disposal/batches/${d.inBatchId}`} className="ml-1 text-xs text-amber hover:underline">
                    in batch #{d.inBatchId}
                  </Link>
                )}
              </td>
              <td className="py-1 pr-2 font-mono text-xs">{d.matter ?? "–"}</td>
              <td className="py-1 pr-2 text-xs">
                {d.cabinetType} · {d.rule}
              </td>
              <td className="py-1 pr-2 font-mono text-xs">{d.filedAt.slice(0, 10)}</td>
              <td className="py-1 pr-2 font-mono text-xs">{d.dueOn}</td>
            </tr>
          ))}
        </tbody>
      </table>
      </div>
      {canPropose && (
        <div className="flex flex-wrap items-end gap-2 rounded border border-paper-edge bg-white/60 p-3">
          <label className="min-w-[16rem] flex-1 text-xs text-ink-soft">
            Note for the approver (why these may go)
            <input value={note} onChange={(e) => setNote(e.target.value)} maxLength={1000} className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink" placeholder="e.g. 2018 invoices, past seven years" data-testid="batch-note" />
          </label>
          <Button onClick={() => setOpen(true)} disabled={picked.size === 0} data-testid="propose">
            Propose {picked.size || ""} for disposal…
          </Button>
        </div>
      )}
      <ConfirmDialog open={open} title={`Propose ${picked.size} ${picked.size === 1 ? "document" : "documents"} for disposal?`} confirmLabel="Propose the batch" busy={busy} error={error} onConfirm={propose} onCancel={() => setOpen(false)}>
        <p>Nothing is destroyed yet. A partner on each matter involved, or another admin, must approve the batch; then the originals are deleted and the text cleared, and only a tombstone remains.</p>
        <p className="text-amber">{caution}</p>
      </ConfirmDialog>
    </div>
  );
}
