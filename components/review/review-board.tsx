"use client";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { DecisionNotice, type Decision } from "@/components/filing/decision-notice";
import { decisionOf, manyAcceptedDecision, type FilingAnswer } from "@/components/filing/decision-words";
import { ApiError, getJson, postJson, type FilingPayload } from "./api";
import { DecisionPanel } from "./decision-panel";
import { QueueTable } from "./queue-table";
import type { MatterOption, Option, QueueItem, QueuePage } from "./types";

type Sort = "age" | "confidence" | "cabinet" | "matter";

const SHORTCUTS: [string, string][] = [
  ["J / ↓", "next document"],
  ["K / ↑", "previous document"],
  ["A", "accept the suggestion"],
  ["2–5", "refile to that runner-up"],
  ["/", "any cabinet type"],
  ["M", "choose the matter"],
  ["C", "confirm (spot-check)"],
  ["X", "select for accepting together"],
];

export function ReviewBoard({ types, matters }: { types: Option[]; matters: MatterOption[] }) {
  const [list, setList] = useState<"review" | "spot-check">("review");
  const [sort, setSort] = useState<Sort>("age");
  const [dir, setDir] = useState<"asc" | "desc">("asc");
  const [cabinetType, setCabinetType] = useState("");
  const [matter, setMatter] = useState("");
  const [confidence, setConfidence] = useState(""); // "", "below:0.5", "above:0.9" …
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const [checked, setChecked] = useState<Set<number>>(new Set());
  const [bar, setBar] = useState(0.9);
  const [message, setMessage] = useState<{ tone: "info" | "error"; text: string } | null>(null);
  const [decision, setDecision] = useState<Decision | null>(null);
  const pickerRef = useRef<HTMLInputElement>(null);

  const key = `/api/review?list=${list}&sort=${sort}&dir=${dir}&pageSize=200${cabinetType ? `&cabinetType=${cabinetType}` : ""}${matter ? `&matter=${matter}` : ""}${confidence ? `&${confidence.startsWith("below") ? "maxConfidence" : "minConfidence"}=${confidence.split(":")[1]}` : ""}`;
  const { data, error, mutate, isLoading } = useSWR<QueuePage>(key, getJson, { refreshInterval: 5000 });
  const items = useMemo(() => data?.items ?? [], [data]);
  const selected = items.find((i) => i.id === selectedId) ?? items[0] ?? null;

  const move = useCallback(
    (step: number) => {
      if (!items.length) return;
      const at = Math.max(0, items.findIndex((i) => i.id === selected?.id));
      setSelectedId(items[Math.min(items.length - 1, Math.max(0, at + step))].id);
    },
    [items, selected],
  );

  /** Files one document; the row leaves the list at once and comes back if the server says no. */
  const decide = useCallback(
    async (item: QueueItem, payload: FilingPayload) => {
      const at = items.findIndex((i) => i.id === item.id);
      const next = items[at + 1] ?? items[at - 1] ?? null;
      setSelectedId(next?.id ?? null);
      try {
        const box: { answer?: FilingAnswer } = {};
        await mutate(
          async (current) => {
            box.answer = await postJson<FilingAnswer>(`/api/documents/${item.id}/filing`, payload);
            return current;
          },
          {
            optimisticData: (current?: QueuePage) => ({ ...(current ?? { page: 1, pageSize: 200 }), items: (current?.items ?? []).filter((i) => i.id !== item.id), total: Math.max(0, (current?.total ?? 1) - 1) }),
            rollbackOnError: true,
            populateCache: false,
            revalidate: true,
          },
        );
        setMessage(null);
        if (box.answer) setDecision(decisionOf(item.name, item.id, box.answer, { types, matters, list }));
      } catch (e) {
        setSelectedId(item.id);
        setMessage({ tone: "error", text: `${item.name} was not filed: ${e instanceof ApiError ? e.message : "the server could not be reached. Try again."}` });
      }
    },
    [items, mutate, types, matters, list],
  );

  const acceptChecked = async () => {
    const ids = [...checked];
    if (!ids.length) return;
    try {
      const r = await postJson<{ accepted: number; results: { ok: boolean; documentId: number; filing?: { eventId: number }; error?: { message: string } }[] }>("/api/review/accept", { documentIds: ids });
      const failed = r.results.filter((x) => !x.ok);
      setDecision(manyAcceptedDecision(r.results, ids.length));
      setMessage(failed.length ? { tone: "error", text: `Not filed: ${failed.map((f) => `#${f.documentId} (${f.error?.message})`).join("; ")}` } : null);
      setChecked(new Set());
    } catch (e) {
      setMessage({ tone: "error", text: e instanceof ApiError ? e.message : "The server could not be reached; nothing was accepted." });
    }
    await mutate();
  };

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement;
      if (["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName) || e.metaKey || e.ctrlKey || e.altKey) return;
      const item = selected;
      const k = e.key.toLowerCase();
      if (k === "j" || e.key === "ArrowDown") move(1);
      else if (k === "k" || e.key === "ArrowUp") move(-1);
      else if (k === "/") pickerRef.current?.focus();
      else if (k === "m") document.getElementById("matter-select")?.focus();
      else if (k === "x" && item) setChecked((c) => new Set(c.has(item.id) ? [...c].filter((i) => i !== item.id) : [...c, item.id]));
      else if (k === "a" && item && list === "review") {
        document.querySelector<HTMLButtonElement>('[data-testid="accept-button"]:not(:disabled)')?.click();
      } else if (k === "c" && item && list === "spot-check") {
        document.querySelector<HTMLButtonElement>('[data-testid="confirm-button"]')?.click();
      } else if (/^[2-5]$/.test(k)) {
        document.querySelectorAll<HTMLButtonElement>('[data-testid="runner-up"]')[Number(k) - 2]?.click();
      } else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [selected, move, list]);

  const aboveBar = items.filter((i) => i.suggestion?.confidence !== null && (i.suggestion?.confidence ?? 0) >= bar && !i.suggestion?.noConfidentMatch && i.suggestion?.matterId && !i.suggestion.matterAmbiguous);

  return (
    <div className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-label="Queue" className="min-w-0 space-y-3">
        <div className="flex flex-wrap items-end gap-3 text-xs">
          <div role="tablist" className="flex overflow-hidden rounded border border-paper-edge">
            {(["review", "spot-check"] as const).map((l) => (
              <button key={l} role="tab" aria-selected={list === l} onClick={() => { setList(l); setChecked(new Set()); setSelectedId(null); }} className={`px-3 py-1 ${list === l ? "bg-verdigris text-white" : "bg-white/60"}`}>
                {l === "review" ? "To review" : "Auto-filed spot-check"}
              </button>
            ))}
          </div>
          <label>
            Cabinet type{" "}
            <select value={cabinetType} onChange={(e) => setCabinetType(e.target.value)} className="rounded border border-paper-edge bg-white px-1 py-0.5">
              <option value="">all</option>
              {types.map((t) => <option key={t.id} value={t.id}>{t.name}</option>)}
            </select>
          </label>
          <label>
            Matter{" "}
            <select value={matter} onChange={(e) => setMatter(e.target.value)} className="rounded border border-paper-edge bg-white px-1 py-0.5">
              <option value="">all</option>
              {matters.map((m) => <option key={m.id} value={m.id}>{m.number}</option>)}
            </select>
          </label>
          <label>
            Confidence{" "}
            <select value={confidence} onChange={(e) => setConfidence(e.target.value)} className="rounded border border-paper-edge bg-white px-1 py-0.5">
              <option value="">any</option>
              <option value="above:0.9">90% and above</option>
              <option value="above:0.7">70% and above</option>
              <option value="below:0.7">below 70%</option>
              <option value="below:0.5">below 50%</option>
            </select>
          </label>
          <span className="ml-auto text-ink-soft">{data ? `${data.total} waiting` : ""}</span>
        </div>

        {list === "review" && items.length > 0 && (
          <div className="flex flex-wrap items-center gap-2 rounded border border-paper-edge bg-white/60 px-3 py-2 text-xs">
            <label>
              Select all at or above{" "}
              <input type="number" min={0.5} max={1} step={0.01} value={bar} onChange={(e) => setBar(Number(e.target.value))} className="w-16 rounded border border-paper-edge px-1" aria-label="Confidence bar for selecting" />
            </label>
            <Button variant="quiet" onClick={() => setChecked(new Set(aboveBar.map((i) => i.id)))}>Select {aboveBar.length}</Button>
            <Button onClick={acceptChecked} disabled={checked.size === 0} data-testid="accept-selected">Accept {checked.size} selected</Button>
            <span className="text-ink-faint">Only documents with a clear matter are selected; check a sample before accepting many.</span>
          </div>
        )}

        <DecisionNotice decision={decision} onUndone={(ids) => { void mutate(); setSelectedId(ids[0] ?? null); }} />
        {message && <Notice tone={message.tone}>{message.text}</Notice>}
        {error && <Notice tone="error">{error.message}</Notice>}
        {isLoading && <p className="text-sm text-ink-soft">Loading the queue…</p>}
        {data && items.length === 0 && (
          <p className="rounded border border-dashed border-paper-edge px-4 py-6 text-sm text-ink-soft">
            {list === "review" ? "Nothing waits for review. New documents appear here once they have been read; drop files at Intake." : "No auto-filed document waits for a spot-check."}
          </p>
        )}
        {items.length > 0 && (
          <div className="max-h-[70vh] overflow-auto">
            <QueueTable
              items={items}
              selectedId={selected?.id ?? null}
              checked={checked}
              sort={sort}
              dir={dir}
              onSort={(s) => { if (s === sort) setDir(dir === "asc" ? "desc" : "asc"); else { setSort(s); setDir(s === "confidence" ? "desc" : "asc"); } }}
              onSelect={setSelectedId}
              onCheck={(id) => setChecked((c) => new Set(c.has(id) ? [...c].filter((x) => x !== id) : [...c, id]))}
            />
          </div>
        )}
        <details className="text-xs text-ink-soft" open>
          <summary className="cursor-pointer">Keyboard shortcuts</summary>
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
            {SHORTCUTS.map(([keys, what]) => (
              <div key={keys} className="contents">
                <dt className="font-mono">{keys}</dt>
                <dd>{what}</dd>
              </div>
            ))}
          </dl>
        </details>
      </section>
      <aside aria-label="Decision" className="min-w-0">
        {selected ? <DecisionPanel key={selected.id} ref={pickerRef} item={selected} list={list} types={types} matters={matters} onDecide={decide} /> : null}
      </aside>
    </div>
  );
}
