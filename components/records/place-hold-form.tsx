"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { requestJson } from "@/components/models/request";

interface PlaceHoldFormProps {
  matters: { id: number; number: string; title: string }[];
  documentId?: number;
}

/** Places a hold on a matter or one document, with a reason and a reference; errors in the server's words. */
export function PlaceHoldForm({ matters, documentId }: PlaceHoldFormProps) {
  const router = useRouter();
  const [target, setTarget] = useState<"matter" | "document">(documentId ? "document" : "matter");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const body = {
      ...(target === "matter" ? { matterId: Number(form.get("matterId")) } : { documentId: Number(form.get("documentId")) }),
      reason: String(form.get("reason") ?? ""),
      reference: String(form.get("reference") ?? ""),
    };
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      const { hold } = await requestJson<{ hold: { id: number } }>("/api/holds", { method: "POST", body: JSON.stringify(body) });
      setDone(`Hold #${hold.id} placed. Nothing it covers can be proposed or destroyed until it is lifted.`);
      (e.target as HTMLFormElement).reset();
      router.refresh();
    } catch (err) {
      setError((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  const input = "mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm";
  return (
    <form onSubmit={submit} className="space-y-3 rounded border border-paper-edge bg-white/60 p-4" data-testid="place-hold-form">
      <h2 className="font-serif text-lg">Place a legal hold</h2>
      <fieldset className="flex gap-4 text-sm">
        <legend className="sr-only">Hold what</legend>
        <label className="flex items-center gap-1">
          <input type="radio" name="target" checked={target === "matter"} onChange={() => setTarget("matter")} /> A whole matter
        </label>
        <label className="flex items-center gap-1">
          <input type="radio" name="target" checked={target === "document"} onChange={() => setTarget("document")} /> One document
        </label>
      </fieldset>
      {target === "matter" ? (
        <label className="block text-xs text-ink-soft">
          Matter
          <select name="matterId" required className={input} data-testid="hold-matter">
            {matters.length === 0 && <option value="">You are on no matter; ask the matter&apos;s partner or an admin</option>}
            {matters.map((m) => (
              <option key={m.id} value={m.id}>
                {m.number} — {m.title}
              </option>
            ))}
          </select>
        </label>
      ) : (
        <label className="block text-xs text-ink-soft">
          Document number
          <input name="documentId" type="number" min={1} required defaultValue={documentId} className={input} data-testid="hold-document" />
        </label>
      )}
      <label className="block text-xs text-ink-soft">
        Reason
        <textarea name="reason" required minLength={3} maxLength={600} rows={2} className={input} placeholder="e.g. Litigation expected over the 2025 lease" data-testid="hold-reason" />
      </label>
      <label className="block text-xs text-ink-soft">
        Reference (case or request number)
        <input name="reference" required maxLength={120} className={input} placeholder="e.g. REQ-2026-014" data-testid="hold-reference" />
      </label>
      {error && (
        <p role="alert" className="rounded bg-brick-light/60 px-3 py-2 text-sm text-brick">
          {error}
        </p>
      )}
      {done && (
        <p role="status" className="text-sm text-verdigris">
          {done}
        </p>
      )}
      <Button type="submit" disabled={busy} data-testid="place-hold">
        {busy ? "Placing…" : "Place hold"}
      </Button>
    </form>
  );
}
