"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { requestJson } from "@/components/ui/request-json";
import { INPUT } from "./field";

interface Props {
  type: { id: number; name: string; active: boolean; filedCount: number };
  others: { id: number; name: string }[];
}

type Open = null | "retire" | "merge";

/**
 * Retire (confirm first; undone by Restore), Restore, and Merge (confirm with the type to merge
 * into). After a retire or merge the page offers a retrain, through the address.
 */
export function CabinetTypeActions({ type, others }: Props) {
  const router = useRouter();
  const [open, setOpen] = useState<Open>(null);
  const [intoId, setIntoId] = useState<number | "">("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const run = async (url: string, init: RequestInit, done: string) => {
    setBusy(true);
    setError(null);
    try {
      await requestJson(url, init);
      setOpen(null);
      router.push(`/setup/cabinet-types?done=${done}&name=${encodeURIComponent(type.name)}`, { scroll: false });
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  const patch = (active: boolean) => run(`/api/cabinet-types/${type.id}`, { method: "PATCH", body: JSON.stringify({ active }) }, active ? "restored" : "retired");
  const merge = () => {
    if (intoId === "") return setError("Choose the cabinet type to merge into.");
    return run(`/api/cabinet-types/${type.id}/merge`, { method: "POST", body: JSON.stringify({ intoId }) }, "merged");
  };
  const into = others.find((o) => o.id === intoId)?.name;

  if (!type.active) {
    return (
      <button type="button" onClick={() => patch(true)} disabled={busy} className="text-xs text-verdigris hover:underline" data-testid="restore">
        {busy ? "Restoring…" : "Restore"}
      </button>
    );
  }
  return (
    <span className="inline-flex gap-3 text-xs">
      <button type="button" onClick={() => { setError(null); setOpen("merge"); }} className="text-verdigris hover:underline" data-testid="merge">
        Merge…
      </button>
      <button type="button" onClick={() => { setError(null); setOpen("retire"); }} className="text-brick hover:underline" data-testid="retire">
        Retire…
      </button>
      <ConfirmDialog open={open === "retire"} title={`Retire "${type.name}"?`} confirmLabel="Retire" busy={busy} error={error} onConfirm={() => patch(false)} onCancel={() => setOpen(null)}>
        <p>It leaves the pickers and the model stops suggesting it. The {type.filedCount} document{type.filedCount === 1 ? "" : "s"} filed there stay where they are, and filters still find them.</p>
        <p>You can restore it later; the retirement stays on the setup record.</p>
      </ConfirmDialog>
      <ConfirmDialog open={open === "merge"} title={`Merge "${type.name}" into another type?`} confirmLabel="Merge" busy={busy} error={error} onConfirm={merge} onCancel={() => setOpen(null)}>
        <label className="block space-y-1">
          <span className="text-xs font-medium text-ink-soft">Merge into</span>
          <select className={INPUT} value={intoId} onChange={(e) => setIntoId(e.target.value ? Number(e.target.value) : "")} data-testid="merge-into">
            <option value="">Choose a cabinet type…</option>
            {others.map((o) => (
              <option key={o.id} value={o.id}>{o.name}</option>
            ))}
          </select>
        </label>
        <p>
          All {type.filedCount} document{type.filedCount === 1 ? "" : "s"} filed in &ldquo;{type.name}&rdquo; move to {into ? <>&ldquo;{into}&rdquo;</> : "the type you choose"}, each move on the
          filing record with the reason &ldquo;merged&rdquo;, and &ldquo;{type.name}&rdquo; is retired. Their retention then follows the new type.
        </p>
        <p className="text-amber">A merge cannot be undone in one step: moving documents back means moving each one.</p>
      </ConfirmDialog>
    </span>
  );
}
