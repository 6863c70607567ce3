"use client";
import { useState } from "react";
import useSWR from "swr";
import { StateBadge } from "./state-badge";

interface Item {
  id: number;
  name: string;
  status: "reading" | "ready" | "unreadable";
  reason: string | null;
  uploadedAt: string;
  uploadedBy: string;
  ocrUsed: boolean;
  pageCount: number | null;
  restricted?: true;
}

const fetcher = (url: string) => fetch(url).then((r) => (r.ok ? r.json() : Promise.reject(new Error(String(r.status)))));
type Filter = "" | "reading" | "ready" | "unreadable";

/** Everything the user dropped lately, filterable by state; refreshes while anything is reading. */
export function RecentIntake() {
  const [status, setStatus] = useState<Filter>("");
  const { data, error, isLoading } = useSWR<{ items: Item[]; total: number }>(
    `/api/documents?mine=1&pageSize=50${status ? `&status=${status}` : ""}`,
    fetcher,
    { refreshInterval: (d) => (d?.items.some((i) => i.status === "reading") ? 2000 : 15000) },
  );
  return (
    <section aria-label="Your recent uploads">
      <div className="mb-2 flex items-end gap-3">
        <h2 className="font-serif text-lg">Your recent uploads</h2>
        <label className="ml-auto text-xs text-ink-soft">
          Show{" "}
          <select value={status} onChange={(e) => setStatus(e.target.value as Filter)} className="rounded border border-paper-edge bg-white px-1 py-0.5">
            <option value="">all</option>
            <option value="reading">reading</option>
            <option value="ready">ready</option>
            <option value="unreadable">unreadable</option>
          </select>
        </label>
      </div>
      {error && <p className="text-sm text-brick">Could not load your uploads. They are safe; reload the page to try again.</p>}
      {isLoading && <p className="text-sm text-ink-soft">Loading…</p>}
      {data && data.items.length === 0 && (
        <p className="rounded border border-dashed border-paper-edge px-4 py-3 text-sm text-ink-soft">
          Nothing here yet. Drop the day&apos;s files above; each one is kept, read and then waits in To review.
        </p>
      )}
      {data && data.items.length > 0 && (
        <table className="w-full border-collapse text-sm">
          <thead className="sticky top-0 bg-paper text-left text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-2 font-medium">#</th>
              <th className="py-1 pr-2 font-medium">File</th>
              <th className="py-1 pr-2 font-medium">Came in (UTC)</th>
              <th className="py-1 pr-2 font-medium">Pages</th>
              <th className="py-1 pr-2 font-medium">State</th>
            </tr>
          </thead>
          <tbody>
            {data.items.map((i) => (
              <tr key={i.id} className="border-t border-paper-edge align-top">
                <td className="py-1 pr-2 font-mono text-xs">{i.id}</td>
                <td className="py-1 pr-2">
                  {i.restricted ? <span>{i.name}</span> : <a href={`/api/documents/${i.id}/original`} className="text-verdigris hover:underline">{i.name}</a>}
                  {i.reason && <p className="text-xs text-ink-soft">{i.reason}</p>}
                </td>
                <td className="py-1 pr-2 font-mono text-xs">{i.uploadedAt.slice(0, 16).replace("T", " ")}</td>
                <td className="py-1 pr-2">{i.restricted ? "–" : `${i.pageCount ?? "–"}${i.ocrUsed ? " (OCR)" : ""}`}</td>
                <td className="py-1 pr-2"><StateBadge state={i.restricted ? "restricted" : i.status} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {data && data.total > data.items.length && <p className="mt-1 text-xs text-ink-faint">Showing the latest {data.items.length} of {data.total}.</p>}
    </section>
  );
}
