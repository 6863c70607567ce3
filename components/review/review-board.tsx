"use client";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { DecisionNotice, type Decision } from "@/components/filing/decision-notice";
import { decisionOf, manyAcceptedDecision, type FilingAnswer } from "@/components/filing/decision-words";
import { ApiError, getJson, postJson, type FilingPayload } from "./api";
import { DecisionPanel } from "./decision-panel";
import { MatterCombobox } from "./matter-combobox";
import { QueueTable } from "./queue-table";
import { pageWords, QUERY_COOKIE, QUEUE_PAGE_SIZE, queueApiUrl, queueSearchParams, type QueueQuery } from "./queue-query";
import type { MatterOption, Option, QueueItem, QueuePage } from "./types";

const chip = (on: boolean) => `rounded border px-2 py-0.5 ${on ? "border-verdigris bg-verdigris text-white" : "border-paper-edge bg-white/70 text-ink hover:bg-paper-deep"}`;

/** The page without these items: total and per-type counts lowered with them, so counts stay true at once. */
function withoutItems(current: QueuePage | undefined, gone: QueueItem[]): QueuePage {
  const base = current ?? { items: [], total: 0, page: 1, pageSize: QUEUE_PAGE_SIZE, byType: [] };
  const ids = new Set(gone.map((g) => g.id));
  const removed = base.items.filter((i) => ids.has(i.id));
  const perType = new Map<number | null, number>();
  for (const r of removed) perType.set(r.suggestion?.cabinetTypeId ?? null, (perType.get(r.suggestion?.cabinetTypeId ?? null) ?? 0) + 1);
  return {
    ...base,
    items: base.items.filter((i) => !ids.has(i.id)),
    total: Math.max(0, base.total - removed.length),
    byType: base.byType.map((t) => ({ ...t, count: Math.max(0, t.count - (perType.get(t.cabinetTypeId) ?? 0)) })).filter((t) => t.count > 0),
  };
}

/** "1–100 of 336 waiting", with the previous and next pages. */
function Pager({ query, data, pages, onPage }: { query: QueueQuery; data: QueuePage | undefined; pages: number; onPage: (page: number) => void }) {
  if (!data) return null;
  const noun = query.list === "review" ? "waiting" : "to spot-check";
  return (
    <nav aria-label="Pages of the queue" className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
      <span data-testid="queue-total">{pageWords(data.page, data.pageSize, data.items.length, data.total)} {noun}</span>
      {pages > 1 && (
        <>
          <span aria-hidden>—</span>
          <button type="button" disabled={query.page <= 1} onClick={() => onPage(query.page - 1)} className="text-verdigris-dark underline-offset-2 hover:underline disabled:text-ink-soft disabled:no-underline">
            previous
          </button>
          <span>page {query.page} of {pages}</span>
          <button type="button" disabled={query.page >= pages} onClick={() => onPage(query.page + 1)} className="text-verdigris-dark underline-offset-2 hover:underline disabled:text-ink-soft disabled:no-underline" data-testid="next-page">
            next
          </button>
        </>
      )}
    </nav>
  );
}

const SHORTCUTS: [string, string][] = [
  ["J / ↓", "next document"],
  ["K / ↑", "previous document"],
  ["A", "accept the suggestion (asks for the matter when none is found)"],
  ["2–5", "refile to that runner-up"],
  ["/", "any cabinet type: type, ↓/↑, Enter"],
  ["M", "choose the matter: type a number, client or title, ↓/↑, Enter"],
  ["Esc", "leave a picker without changing anything; back to the queue"],
  ["C", "confirm (spot-check)"],
  ["X", "select for accepting together"],
  ["Shift+M", "one matter for all selected"],
  ["Shift+A", "accept all selected"],
];

/** Matters this browser filed into last (most recent first), offered after the ones found in the document. */
const RECENT_KEY = "foldwright.recentMatters";
function readRecent(): number[] {
  if (typeof window === "undefined") return [];
  try {
    const v = JSON.parse(window.localStorage.getItem(RECENT_KEY) ?? "[]");
    return Array.isArray(v) ? v.filter((x) => Number.isInteger(x)).slice(0, 5) : [];
  } catch {
    return [];
  }
}

export function ReviewBoard({ types, matters, initialQuery }: { types: Option[]; matters: MatterOption[]; initialQuery: QueueQuery }) {
  const [query, setQuery] = useState<QueueQuery>(initialQuery);
  const { list, sort, dir } = query;
  const [searchText, setSearchText] = useState(initialQuery.q);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const [checked, setChecked] = useState<Set<number>>(new Set());
  const [bar, setBar] = useState(0.9);
  const [message, setMessage] = useState<{ tone: "info" | "error"; text: string } | null>(null);
  const [decision, setDecision] = useState<Decision | null>(null);
  const pickerRef = useRef<HTMLInputElement>(null);
  const queueRef = useRef<HTMLElement>(null);
  const [recent, setRecent] = useState<number[]>(readRecent);
  const [bulkMatter, setBulkMatterState] = useState<number | null>(null);
  // Also in a ref: Shift+A right after choosing the matter must already send it.
  const bulkMatterRef = useRef<number | null>(null);
  const setBulkMatter = useCallback((id: number | null) => {
    bulkMatterRef.current = id;
    setBulkMatterState(id);
  }, []);
  const focusQueue = useCallback(() => queueRef.current?.focus({ preventScroll: true }), []);
  const remember = useCallback((matterId: number | undefined) => {
    if (!matterId) return;
    setRecent((r) => {
      const next = [matterId, ...r.filter((x) => x !== matterId)].slice(0, 5);
      try {
        window.localStorage.setItem(RECENT_KEY, JSON.stringify(next));
      } catch {
        // storage switched off: remembered for this page only
      }
      return next;
    });
  }, []);

  /** A change of sort, filter or search starts again at page 1; a page change keeps the rest. */
  const update = useCallback((patch: Partial<QueueQuery>) => {
    setQuery((q) => ({ ...q, page: 1, ...patch }));
    setSelectedId(null);
  }, []);

  // The address and the browser's memory follow every change, so a reload keeps it.
  useEffect(() => {
    const params = queueSearchParams(query).toString();
    window.history.replaceState(window.history.state, "", params ? `/review?${params}` : "/review");
    // Remembered in a cookie the page reads, so coming back from the rail (a bare /review) keeps it.
    document.cookie = `${QUERY_COOKIE}=${encodeURIComponent(params)}; path=/review; max-age=${60 * 60 * 24 * 180}; samesite=lax`;
  }, [query]);
  // Search as you type, a moment after the last key.
  useEffect(() => {
    if (searchText.trim() === query.q.trim()) return;
    const t = setTimeout(() => update({ q: searchText }), 300);
    return () => clearTimeout(t);
  }, [searchText, query.q, update]);

  const key = queueApiUrl(query);
  const { data, error, mutate, isLoading } = useSWR<QueuePage>(key, getJson, { refreshInterval: 5000, keepPreviousData: true });
  const items = useMemo(() => data?.items ?? [], [data]);
  const selected = items.find((i) => i.id === selectedId) ?? items[0] ?? null;
  const pages = data ? Math.max(1, Math.ceil(data.total / QUEUE_PAGE_SIZE)) : 1;

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
      setChecked((c) => (c.has(item.id) ? new Set([...c].filter((x) => x !== item.id)) : c));
      try {
        const box: { answer?: FilingAnswer } = {};
        await mutate(
          async (current) => {
            box.answer = await postJson<FilingAnswer>(`/api/documents/${item.id}/filing`, payload);
            return current;
          },
          {
            optimisticData: (current?: QueuePage) => withoutItems(current, [item]),
            rollbackOnError: true,
            populateCache: false,
            revalidate: true,
          },
        );
        remember(payload.matterId);
        setMessage(null);
        if (box.answer) setDecision(decisionOf(item.name, item.id, box.answer, { types, matters, list }));
      } catch (e) {
        setSelectedId(item.id);
        setMessage({ tone: "error", text: `${item.name} was not filed: ${e instanceof ApiError ? e.message : "the server could not be reached. Try again."}` });
      }
    },
    [items, mutate, types, matters, list, remember],
  );

  // The selection as it stands on this page: a row that left the queue leaves the count too.
  const selection = useMemo(() => items.filter((i) => checked.has(i.id)), [items, checked]);
  const acceptChecked = useCallback(async () => {
    const chosen = selection;
    if (!chosen.length) return;
    const ids = chosen.map((i) => i.id);
    const bulkMatter = bulkMatterRef.current;
    try {
      const r = await postJson<{ accepted: number; results: { ok: boolean; documentId: number; filing?: { eventId: number }; error?: { message: string } }[] }>("/api/review/accept", { documentIds: ids, ...(bulkMatter ? { matterId: bulkMatter } : {}) });
      const failed = r.results.filter((x) => !x.ok);
      const filed = new Set(r.results.filter((x) => x.ok).map((x) => x.documentId));
      await mutate((current) => withoutItems(current, chosen.filter((i) => filed.has(i.id))), { revalidate: false });
      const names = new Map(chosen.map((i) => [i.id, i.name]));
      setDecision(manyAcceptedDecision(r.results, ids.length));
      setMessage(failed.length ? { tone: "error", text: `Not filed: ${failed.map((f) => `${names.get(f.documentId) ?? `#${f.documentId}`} (${f.error?.message})`).join("; ")}` } : null);
      if (bulkMatter && r.accepted) remember(bulkMatter);
      setChecked(new Set(failed.map((f) => f.documentId)));
    } catch (e) {
      setMessage({ tone: "error", text: e instanceof ApiError ? e.message : "The server could not be reached; nothing was accepted." });
    }
    setSelectedId(null);
    await mutate();
  }, [selection, mutate, remember]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement;
      if (["INPUT", "SELECT", "TEXTAREA"].includes(target.tagName) || e.metaKey || e.ctrlKey || e.altKey) return;
      const item = selected;
      const k = e.key.toLowerCase();
      if (e.shiftKey && k === "a") void acceptChecked();
      else if (e.shiftKey && k === "m") document.getElementById("bulk-matter")?.focus();
      else if (k === "j" || e.key === "ArrowDown") move(1);
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
  }, [selected, move, list, acceptChecked]);

  const aboveBar = items.filter((i) => i.suggestion?.confidence !== null && (i.suggestion?.confidence ?? 0) >= bar && !i.suggestion?.noConfidentMatch && i.suggestion?.matterId && !i.suggestion.matterAmbiguous);

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-label="Queue" ref={queueRef} tabIndex={-1} id="queue" className="min-w-0 space-y-3 outline-none">
        <div className="flex flex-wrap items-end gap-3 text-xs">
          <div role="tablist" className="flex overflow-hidden rounded border border-paper-edge">
            {(["review", "spot-check"] as const).map((l) => (
              <button key={l} role="tab" aria-selected={list === l} onClick={() => { update({ list: l }); setChecked(new Set()); }} className={`px-3 py-1 ${list === l ? "bg-verdigris text-white" : "bg-white/60"}`}>
                {l === "review" ? "To review" : "Auto-filed spot-check"}
              </button>
            ))}
          </div>
          <label className="flex min-w-0 flex-1 basis-48 flex-col gap-0.5">
            Search name and words
            <input
              type="search"
              value={searchText}
              onChange={(e) => setSearchText(e.target.value)}
              onKeyDown={(e) => { if (e.key === "Enter") update({ q: searchText }); }}
              placeholder="e.g. invoice 0117"
              data-testid="queue-search"
              className="rounded border border-paper-edge bg-white px-2 py-1 text-sm"
            />
          </label>
          <label>
            Cabinet type{" "}
            <select value={query.cabinetType ?? ""} onChange={(e) => update({ cabinetType: e.target.value ? Number(e.target.value) : null })} className="rounded border border-paper-edge bg-white px-1 py-0.5" data-testid="queue-type-filter">
              <option value="">all</option>
              {types.map((t) => <option key={t.id} value={t.id}>{t.name}</option>)}
            </select>
          </label>
          <label>
            Matter{" "}
            <select value={query.matter ?? ""} onChange={(e) => update({ matter: e.target.value ? Number(e.target.value) : null })} className="rounded border border-paper-edge bg-white px-1 py-0.5">
              <option value="">all</option>
              {matters.map((m) => <option key={m.id} value={m.id}>{m.number}</option>)}
            </select>
          </label>
          <label>
            Confidence{" "}
            <select value={query.confidence} onChange={(e) => update({ confidence: e.target.value })} className="rounded border border-paper-edge bg-white px-1 py-0.5">
              <option value="">any</option>
              <option value="above:0.9">90% and above</option>
              <option value="above:0.7">70% and above</option>
              <option value="below:0.7">below 70%</option>
              <option value="below:0.5">below 50%</option>
            </select>
          </label>
          <Button
            variant="quiet"
            aria-pressed={sort === "age" && dir === "desc"}
            onClick={() => update(sort === "age" && dir === "desc" ? { sort: "age", dir: "asc" } : { sort: "age", dir: "desc" })}
            data-testid="newest-first"
            className="py-1 text-xs"
          >
            {sort === "age" && dir === "desc" ? "Longest waiting first" : "Newest uploads first"}
          </Button>
        </div>

        {data && data.byType.length > 0 && (
          <div aria-label="Waiting per cabinet type" role="group" className="flex flex-wrap gap-1 text-xs" data-testid="type-counts">
            <button type="button" aria-pressed={!query.cabinetType} onClick={() => update({ cabinetType: null })} className={chip(!query.cabinetType)}>
              All <span className="font-semibold">{data.byType.reduce((n, t) => n + t.count, 0)}</span>
            </button>
            {data.byType.map((t) =>
              t.cabinetTypeId ? (
                <button key={t.cabinetTypeId} type="button" aria-pressed={query.cabinetType === t.cabinetTypeId} onClick={() => update({ cabinetType: query.cabinetType === t.cabinetTypeId ? null : t.cabinetTypeId })} className={chip(query.cabinetType === t.cabinetTypeId)} data-testid="type-count" data-type-id={t.cabinetTypeId}>
                  {t.cabinetType} <span className="font-semibold">{t.count}</span>
                </button>
              ) : (
                <span key="none" className="rounded border border-dashed border-paper-edge px-2 py-0.5 text-ink-soft">
                  File by hand <span className="font-semibold">{t.count}</span>
                </span>
              ),
            )}
          </div>
        )}

        <Pager query={query} data={data} pages={pages} onPage={(page) => { setQuery((q) => ({ ...q, page })); setSelectedId(null); }} />

        {list === "review" && items.length > 0 && (
          <div className="flex flex-wrap items-center gap-2 rounded border border-paper-edge bg-white/60 px-3 py-2 text-xs">
            <label>
              Select all at or above{" "}
              <input type="number" min={0.5} max={1} step={0.01} value={bar} onChange={(e) => setBar(Number(e.target.value))} className="w-16 rounded border border-paper-edge px-1" aria-label="Confidence bar for selecting" />
            </label>
            <Button variant="quiet" onClick={() => setChecked(new Set(aboveBar.map((i) => i.id)))}>Select {aboveBar.length}</Button>
            <span className="text-ink-soft">Only documents with a clear matter are selected; check a sample before accepting many.</span>
          </div>
        )}

        {list === "review" && selection.length > 0 && (
          <div className="grid gap-2 rounded border border-verdigris bg-verdigris-light/40 px-3 py-2 text-xs sm:grid-cols-[minmax(0,1fr)_auto] sm:items-end" data-testid="bulk-bar">
            <MatterCombobox
              id="bulk-matter"
              label={`One matter for all ${selection.length} selected (Shift+M) — or leave empty to keep each one's own`}
              matters={matters}
              recent={recent}
              value={bulkMatter}
              onChange={setBulkMatter}
              onDone={focusQueue}
            />
            <Button onClick={acceptChecked} data-testid="accept-selected">
              Accept {selection.length} selected <kbd className="font-mono text-xs opacity-80">Shift+A</kbd>
            </Button>
          </div>
        )}

        <DecisionNotice decision={decision} onUndone={(ids) => { void mutate(); setSelectedId(ids[0] ?? null); }} />
        {message && <Notice tone={message.tone}>{message.text}</Notice>}
        {error && <Notice tone="error">{error.message}</Notice>}
        {isLoading && <p className="text-sm text-ink-soft">Loading the queue…</p>}
        {data && items.length === 0 && (
          <p className="rounded border border-dashed border-paper-edge px-4 py-6 text-sm text-ink-soft">
            {query.q.trim() || query.cabinetType || query.matter || query.confidence
              ? "Nothing waiting matches this search or these filters. Clear them to see the whole queue."
              : list === "review"
                ? "Nothing waits for review. New documents appear here once they have been read; drop files at Intake."
                : "No auto-filed document waits for a spot-check."}
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
              onSort={(s) => update(s === sort ? { dir: dir === "asc" ? "desc" : "asc" } : { sort: s, dir: s === "confidence" ? "desc" : "asc" })}
              onSelect={setSelectedId}
              onCheck={(id) => setChecked((c) => new Set(c.has(id) ? [...c].filter((x) => x !== id) : [...c, id]))}
            />
          </div>
        )}
        {items.length > 0 && pages > 1 && <Pager query={query} data={data} pages={pages} onPage={(page) => { setQuery((q) => ({ ...q, page })); setSelectedId(null); }} />}
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
      <aside aria-label="Decision" className="min-w-0 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
        {selected ? <DecisionPanel key={selected.id} ref={pickerRef} item={selected} list={list} types={types} matters={matters} onDecide={decide} recent={recent} onQueueFocus={focusQueue} /> : null}
      </aside>
    </div>
  );
}
