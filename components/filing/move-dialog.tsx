"use client";
// Move a filed document to another cabinet type and/or matter, with a reason (on the record as
// "moved"). One dialog per page, opened by any MoveButton inside the MoveProvider; the provider
// also shows the confirmation with Undo, above the page's content, so it survives the row moving
// out of the list it was in.
import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { requestJson } from "@/components/ui/request-json";
import { DecisionNotice, type Decision } from "./decision-notice";
import { decisionOf, type FilingAnswer } from "./decision-words";
import { ReasonField } from "./reason-field";

export interface MovableDocument {
  id: number;
  name: string;
  cabinetTypeId: number | null;
  matterId: number | null;
}

export interface MoveOptions {
  types: { id: number; name: string }[];
  matters: { id: number; number: string; title: string; clientName: string; restricted?: boolean }[];
}

const MoveContext = createContext<((doc: MovableDocument) => void) | null>(null);

export function MoveProvider({ types, matters, children }: MoveOptions & { children: React.ReactNode }) {
  const router = useRouter();
  const [doc, setDoc] = useState<MovableDocument | null>(null);
  const [decision, setDecision] = useState<Decision | null>(null);
  const moved = useCallback(
    (d: Decision) => {
      setDoc(null);
      setDecision(d);
      router.refresh();
    },
    [router],
  );
  return (
    <MoveContext.Provider value={setDoc}>
      <DecisionNotice decision={decision} onUndone={() => router.refresh()} className="mb-3" />
      {children}
      {doc && <MoveDialog key={doc.id} doc={doc} types={types} matters={matters} onCancel={() => setDoc(null)} onMoved={moved} />}
    </MoveContext.Provider>
  );
}

export function MoveButton({ doc, className }: { doc: MovableDocument; className?: string }) {
  const open = useContext(MoveContext);
  if (!open) return null;
  return (
    <button type="button" onClick={() => open(doc)} className={className ?? "text-xs text-verdigris hover:underline"} data-testid="move-button" aria-label={`Move ${doc.name}`}>
      Move…
    </button>
  );
}

const FIELD = "mt-1 w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm text-ink";

function MoveDialog({ doc, types, matters, onCancel, onMoved }: MoveOptions & { doc: MovableDocument; onCancel: () => void; onMoved: (d: Decision) => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  const [typeId, setTypeId] = useState(doc.cabinetTypeId ?? types[0]?.id ?? 0);
  const [matterId, setMatterId] = useState(doc.matterId ?? matters[0]?.id ?? 0);
  const [reason, setReason] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const here = useMemo(
    () => `${types.find((t) => t.id === doc.cabinetTypeId)?.name ?? "no cabinet type"} of ${matters.find((m) => m.id === doc.matterId)?.number ?? "no matter"}`,
    [doc, types, matters],
  );

  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
  }, []);

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    if (typeId === doc.cabinetTypeId && matterId === doc.matterId) return setError("It is already there. Choose another cabinet type or matter.");
    if (!reason.trim()) return setError("Say why it moves: pick a common reason or write a few words.");
    setBusy(true);
    setError(null);
    try {
      const answer = await requestJson<FilingAnswer>(`/api/documents/${doc.id}/filing`, {
        method: "POST",
        body: JSON.stringify({ action: "move", cabinetTypeId: typeId, matterId, reason: reason.trim(), expectedCabinetTypeId: doc.cabinetTypeId ?? undefined, expectedMatterId: doc.matterId ?? undefined }),
      });
      onMoved({ ...decisionOf(doc.name, doc.id, answer, { types, matters: matters.map((m) => ({ id: m.id, number: m.number })) }), undoneWords: `is back in ${here}` });
    } catch (err) {
      setError(err instanceof Error ? err.message : String(err));
      setBusy(false);
    }
  };

  return (
    <dialog
      ref={ref}
      onCancel={(e) => {
        e.preventDefault();
        if (!busy) onCancel();
      }}
      aria-labelledby="move-title"
      className="m-auto w-full max-w-lg rounded border border-paper-edge bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/30"
      data-testid="move-dialog"
    >
      <form onSubmit={submit} className="space-y-3 p-5">
        <h2 id="move-title" className="break-words font-serif text-lg">Move {doc.name}</h2>
        <p className="text-sm text-ink-soft">Now in {here}. The move goes on the record with your reason; Undo stays on screen for a short while after.</p>
        <label className="block text-xs text-ink-soft">
          Cabinet type
          <select id="move-type" value={typeId} onChange={(e) => setTypeId(Number(e.target.value))} className={FIELD}>
            {types.map((t) => (
              <option key={t.id} value={t.id}>{t.name}{t.id === doc.cabinetTypeId ? " (now)" : ""}</option>
            ))}
          </select>
        </label>
        <label className="block text-xs text-ink-soft">
          Matter
          <select id="move-matter" value={matterId} onChange={(e) => setMatterId(Number(e.target.value))} className={FIELD}>
            {matters.map((m) => (
              <option key={m.id} value={m.id}>
                {m.number} — {m.clientName}: {m.title}{m.restricted ? " (restricted)" : ""}{m.id === doc.matterId ? " (now)" : ""}
              </option>
            ))}
          </select>
        </label>
        <ReasonField id="move-reason" value={reason} onChange={setReason} required label="Why it moves" />
        {error && (
          <p role="alert" className="rounded bg-brick-light/60 px-3 py-2 text-sm text-brick">{error}</p>
        )}
        <div className="flex justify-end gap-2 pt-1">
          <Button type="button" variant="quiet" onClick={onCancel} disabled={busy}>Cancel</Button>
          <Button type="submit" disabled={busy} data-testid="move-submit">{busy ? "Moving…" : "Move"}</Button>
        </div>
      </form>
    </dialog>
  );
}
