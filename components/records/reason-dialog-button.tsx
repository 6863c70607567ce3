"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/models/confirm-dialog";
import { requestJson } from "@/components/models/request";

interface ReasonDialogButtonProps {
  label: string;
  title: string;
  url: string;
  confirmLabel: string;
  reasonLabel?: string; // omitted: no reason asked (approval)
  children?: React.ReactNode;
  variant?: "primary" | "quiet" | "danger";
  testId: string;
}

/** A button that asks first (and for a reason when one is needed), then POSTs and refreshes the screen. */
export function ReasonDialogButton({ label, title, url, confirmLabel, reasonLabel, children, variant = "quiet", testId }: ReasonDialogButtonProps) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [result, setResult] = useState<string | null>(null);

  async function confirm() {
    setBusy(true);
    setError(null);
    try {
      const body = await requestJson<{ disposed?: number; keptHold?: number; pendingDeletion?: number }>(url, { method: "POST", body: JSON.stringify(reasonLabel ? { reason } : {}) });
      if (body.disposed !== undefined) {
        setResult(`${body.disposed} destroyed${body.keptHold ? `, ${body.keptHold} kept under a legal hold` : ""}${body.pendingDeletion ? `; ${body.pendingDeletion} originals still to remove: approve again to retry` : ""}.`);
      }
      setOpen(false);
      setReason("");
      router.refresh();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <>
      <Button variant={variant} onClick={() => setOpen(true)} data-testid={testId}>
        {label}
      </Button>
      {result && (
        <span role="status" className="text-sm text-ink-soft">
          {result}
        </span>
      )}
      <ConfirmDialog open={open} title={title} confirmLabel={confirmLabel} busy={busy} error={error} onConfirm={confirm} onCancel={() => setOpen(false)}>
        {children}
        {reasonLabel && (
          <label className="block text-xs text-ink-soft">
            {reasonLabel}
            <textarea value={reason} onChange={(e) => setReason(e.target.value)} rows={2} maxLength={600} className="mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink" data-testid={`${testId}-reason`} />
          </label>
        )}
      </ConfirmDialog>
    </>
  );
}
