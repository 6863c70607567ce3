"use client";
import { useMemo, useState } from "react";
import { formatDuration, formatPercent, formatUtc } from "@/components/document/format";
import { cn } from "@/lib/utils";
import { SortHeader, type SortDir } from "./sort-header";
import { STATUS_WORDS, canBecomeCurrent, formatF1, triggerWords, type ModelStatus, type ModelVersion } from "./types";

type SortKey = "id" | "date" | "macroF1";

interface VersionsTableProps {
  versions: ModelVersion[];
  canManage: boolean;
  onMakeCurrent: (v: ModelVersion) => void;
}

const TH = "sticky top-0 z-10 border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";
const TD = "px-2 py-1.5 align-top";

function sortValue(v: ModelVersion, key: SortKey): number {
  if (key === "id") return v.id;
  if (key === "date") return Date.parse(v.finishedAt ?? v.createdAt);
  return v.macroF1 ?? -1;
}

function StatusBadge({ status }: { status: ModelStatus }) {
  return (
    <span
      className={cn(
        "inline-block whitespace-nowrap rounded px-1.5 py-0.5 text-xs font-medium",
        status === "current" && "bg-verdigris text-white",
        status === "candidate" && "bg-verdigris-light text-verdigris-dark",
        status === "training" && "bg-paper-deep text-ink-soft",
        status === "retired" && "bg-paper-deep text-ink-soft",
        status === "rejected" && "bg-amber-light text-amber",
        status === "failed" && "bg-brick-light text-brick",
      )}
    >
      {STATUS_WORDS[status]}
    </span>
  );
}

/** macro-F1 beside the score the current model's settings got on the same folds. */
function F1Comparison({ v }: { v: ModelVersion }) {
  if (v.macroF1 === null) return <span className="text-ink-faint">–</span>;
  if (v.comparedMacroF1 === null) return <span className="font-mono">{formatF1(v.macroF1)}</span>;
  const delta = v.macroF1 - v.comparedMacroF1;
  return (
    <span className="whitespace-nowrap font-mono">
      {formatF1(v.macroF1)} <span className="text-xs text-ink-soft">vs {formatF1(v.comparedMacroF1)}</span>{" "}
      <span className={cn("text-xs", delta < -0.01 ? "text-brick" : "text-ink-soft")}>({delta >= 0 ? "+" : "−"}{Math.abs(delta).toFixed(3)})</span>
    </span>
  );
}

/** Every model version, sortable by number, date or macro-F1 and filterable by status. */
export function VersionsTable({ versions, canManage, onMakeCurrent }: VersionsTableProps) {
  const [sort, setSort] = useState<{ key: SortKey; dir: SortDir }>({ key: "id", dir: "desc" });
  const [status, setStatus] = useState<"" | ModelStatus>("");
  const rows = useMemo(() => {
    const shown = status ? versions.filter((v) => v.status === status) : versions;
    const sign = sort.dir === "asc" ? 1 : -1;
    return [...shown].sort((a, b) => sign * (sortValue(a, sort.key) - sortValue(b, sort.key)) || b.id - a.id);
  }, [versions, status, sort]);
  const onSort = (key: SortKey) => setSort((s) => (s.key === key ? { key, dir: s.dir === "asc" ? "desc" : "asc" } : { key, dir: "desc" }));

  return (
    <section aria-labelledby="versions-heading">
      <div className="mb-2 flex items-end gap-3">
        <h2 id="versions-heading" className="font-serif text-lg">Versions</h2>
        <label className="ml-auto text-xs text-ink-soft">
          Show{" "}
          <select value={status} onChange={(e) => setStatus(e.target.value as "" | ModelStatus)} className="rounded border border-paper-edge bg-white px-1 py-0.5" data-testid="version-status-filter">
            <option value="">all versions</option>
            {(Object.keys(STATUS_WORDS) as ModelStatus[]).map((s) => (
              <option key={s} value={s}>{STATUS_WORDS[s].toLowerCase()}</option>
            ))}
          </select>
        </label>
      </div>
      {rows.length === 0 ? (
        <p className="rounded border border-dashed border-paper-edge px-4 py-3 text-sm text-ink-soft">No versions with this status.</p>
      ) : (
        <div className="max-h-[60vh] overflow-auto rounded border border-paper-edge bg-white/70">
          <table className="w-full border-collapse text-sm" data-testid="versions-table">
            <thead>
              <tr>
                <SortHeader label="Version" sortKey="id" active={sort.key} dir={sort.dir} onSort={onSort} className={TH} />
                <th scope="col" className={TH}>Status</th>
                <SortHeader label="Trained (UTC)" sortKey="date" active={sort.key} dir={sort.dir} onSort={onSort} className={TH} />
                <th scope="col" className={TH}>Documents</th>
                <SortHeader label="Macro-F1 vs current" sortKey="macroF1" active={sort.key} dir={sort.dir} onSort={onSort} className={TH} />
                <th scope="col" className={TH}>Auto-file bar</th>
                <th scope="col" className={TH}>Why</th>
                {canManage && <th scope="col" className={TH}><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {rows.map((v) => (
                <tr key={v.id} className="border-t border-paper-edge/70" data-testid="version-row" data-status={v.status}>
                  <td className={`${TD} font-mono`}>#{v.id}</td>
                  <td className={TD}><StatusBadge status={v.status} /></td>
                  <td className={`${TD} whitespace-nowrap`}>
                    <span className="font-mono text-xs">{formatUtc(v.finishedAt ?? v.createdAt)}</span>
                    <p className="text-xs text-ink-soft">
                      {triggerWords(v)}
                      {v.durationMs !== null && ` · ${formatDuration(v.durationMs)}`}
                    </p>
                  </td>
                  <td className={`${TD} font-mono text-xs`}>
                    {v.trainCount ?? "–"}
                    {v.classCount !== null && <p className="font-sans text-ink-soft">{v.classCount} types</p>}
                  </td>
                  <td className={TD}><F1Comparison v={v} /></td>
                  <td className={`${TD} whitespace-nowrap font-mono text-xs`}>
                    {v.autoFileThreshold !== null ? formatPercent(v.autoFileThreshold, 1) : v.status === "training" || v.status === "failed" ? "–" : "none"}
                    {v.autoFileShare !== null && v.autoFileThreshold !== null && <p className="font-sans text-ink-soft">{formatPercent(v.autoFileShare)} pass</p>}
                  </td>
                  <td className={`${TD} min-w-64 text-xs text-ink-soft`}>{v.status === "training" ? v.progress ?? "Training" : v.reason ?? ""}</td>
                  {canManage && (
                    <td className={`${TD} whitespace-nowrap text-right`}>
                      {canBecomeCurrent(v) && (
                        <button
                          type="button"
                          onClick={() => onMakeCurrent(v)}
                          className="rounded border border-paper-edge bg-white/60 px-2 py-1 text-xs font-medium hover:bg-paper-deep"
                          data-testid="make-current"
                        >
                          Make current
                        </button>
                      )}
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
