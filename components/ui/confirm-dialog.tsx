"use client";
import { useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: React.ReactNode;
  confirmLabel: string;
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** A modal question on the native <dialog>: focus stays inside, Escape cancels, Cancel has the focus first. */
export function ConfirmDialog({ open, title, children, confirmLabel, busy, error, onConfirm, onCancel }: ConfirmDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onCancel={(e) => {
        e.preventDefault();
        if (!busy) onCancel();
      }}
      aria-labelledby="confirm-title"
      className="m-auto w-full max-w-lg rounded border border-paper-edge bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/30"
      data-testid="confirm-dialog"
    >
      <div className="space-y-3 p-5">
        <h2 id="confirm-title" className="font-serif text-lg">{title}</h2>
        <div className="space-y-2 text-sm">{children}</div>
        {error && (
          <p role="alert" className="rounded bg-brick-light/60 px-3 py-2 text-sm text-brick">
            {error}
          </p>
        )}
        <div className="flex justify-end gap-2 pt-1">
          <Button variant="quiet" onClick={onCancel} disabled={busy} autoFocus>
            Cancel
          </Button>
          <Button onClick={onConfirm} disabled={busy} data-testid="confirm">
            {busy ? "Working…" : confirmLabel}
          </Button>
        </div>
      </div>
    </dialog>
  );
}
