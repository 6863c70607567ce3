"use client";
// The original's pages as images (GET /api/documents/{id}/preview?page=N), with page-through and
// zoom, by button or by key while the preview has the focus: ← → (or Page Up / Page Down) turn
// pages, + and − zoom, 0 fits the width.
import { useCallback, useEffect, useState } from "react";
import { cn } from "@/lib/utils";

const ZOOMS = [1, 1.5, 2, 3] as const; // × the panel's width; 1 fits it

interface Shown {
  url: string;
  page: number;
}

export function PagePreview({ documentId, name, pageCount: initialCount }: { documentId: number; name: string; pageCount: number | null }) {
  const [page, setPage] = useState(1);
  const [count, setCount] = useState(initialCount ?? 1);
  const [zoom, setZoom] = useState(0); // index into ZOOMS
  const [shown, setShown] = useState<Shown | null>(null);
  const [failed, setFailed] = useState<{ page: number; message: string } | null>(null);
  const loading = shown?.page !== page && failed?.page !== page;
  const error = failed?.page === page ? failed.message : null;

  useEffect(() => {
    let cancelled = false;
    let url: string | null = null;
    fetch(`/api/documents/${documentId}/preview?page=${page}`)
      .then(async (res) => {
        if (!res.ok) {
          const body = (await res.json().catch(() => null)) as { error?: { message?: string } } | null;
          throw new Error(body?.error?.message ?? `The server answered ${res.status}. Download the original to see it.`);
        }
        const n = Number(res.headers.get("x-page-count"));
        const blob = await res.blob();
        if (cancelled) return;
        if (n > 0) setCount(n);
        url = URL.createObjectURL(blob);
        setShown({ url, page });
      })
      .catch((e: unknown) => !cancelled && setFailed({ page, message: e instanceof Error ? e.message : "Foldwright could not be reached. Try again." }));
    return () => {
      cancelled = true;
      if (url) URL.revokeObjectURL(url);
    };
  }, [documentId, page]);

  const turn = useCallback((step: number) => setPage((p) => Math.min(count, Math.max(1, p + step))), [count]);
  const onKey = (e: React.KeyboardEvent) => {
    if (e.metaKey || e.ctrlKey || e.altKey) return;
    if (e.key === "ArrowRight" || e.key === "PageDown") turn(1);
    else if (e.key === "ArrowLeft" || e.key === "PageUp") turn(-1);
    else if (e.key === "+" || e.key === "=") setZoom((z) => Math.min(ZOOMS.length - 1, z + 1));
    else if (e.key === "-") setZoom((z) => Math.max(0, z - 1));
    else if (e.key === "0") setZoom(0);
    else return;
    e.preventDefault();
  };

  const button = "rounded border border-paper-edge bg-white/70 px-2 py-0.5 text-xs hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-50";
  return (
    <section aria-labelledby="preview-heading" className="min-w-0" data-testid="page-preview">
      <div className="mb-1 flex flex-wrap items-center gap-2">
        <h2 id="preview-heading" className="mr-auto font-serif text-lg">The page</h2>
        <button type="button" className={button} onClick={() => turn(-1)} disabled={page <= 1} aria-label="Previous page">‹ Previous</button>
        <span className="text-xs text-ink-soft" aria-live="polite" data-testid="preview-page">Page {page} of {count}</span>
        <button type="button" className={button} onClick={() => turn(1)} disabled={page >= count} aria-label="Next page">Next ›</button>
        <span className="ml-2 inline-flex gap-1" role="group" aria-label="Zoom">
          <button type="button" className={button} onClick={() => setZoom((z) => Math.max(0, z - 1))} disabled={zoom === 0} aria-label="Zoom out">−</button>
          <button type="button" className={button} onClick={() => setZoom(0)} aria-pressed={zoom === 0}>Fit</button>
          <button type="button" className={button} onClick={() => setZoom((z) => Math.min(ZOOMS.length - 1, z + 1))} disabled={zoom === ZOOMS.length - 1} aria-label="Zoom in">+</button>
        </span>
      </div>
      <div
        tabIndex={0}
        onKeyDown={onKey}
        aria-label={`Page ${page} of ${count} of ${name}. Left and right arrows turn pages, plus and minus zoom.`}
        className="relative max-h-[48rem] overflow-auto rounded border border-paper-edge bg-paper-deep/60 focus:outline focus:outline-2 focus:outline-verdigris"
        data-testid="preview-frame"
      >
        {error ? (
          <p role="alert" className="p-4 text-sm text-brick">{error}</p>
        ) : shown ? (
          // An object URL of a PNG the server drew: next/image has nothing to optimise here.
          // eslint-disable-next-line @next/next/no-img-element
          <img src={shown.url} alt={`Page ${shown.page} of ${name}`} style={{ width: `${ZOOMS[zoom] * 100}%`, maxWidth: "none" }} className={cn("block bg-white", loading && "opacity-60")} data-testid="preview-image" />
        ) : (
          <p className="p-4 text-sm text-ink-soft">Drawing the page…</p>
        )}
      </div>
      <p className="mt-1 text-xs text-ink-faint">The original as it is; the text read beside it is what Foldwright learned from.</p>
    </section>
  );
}
