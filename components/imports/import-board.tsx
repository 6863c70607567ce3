"use client";
import { useState } from "react";
import Link from "next/link";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/ui/request-json";
import { formatSize, formatUtc } from "@/components/document/format";
import type { ImportFileState, ImportView } from "@/lib/data/imports";
import type { ImportMapping } from "@/lib/validations/imports";
import { cn } from "@/lib/utils";

interface Option {
  id: number;
  label: string;
}

const fetcher = (url: string) => fetch(url).then((r) => (r.ok ? r.json() : Promise.reject(new Error(String(r.status)))));

const FILE_STATES: Record<ImportFileState, { label: string; tone: "ok" | "wait" | "look" | "bad" }> = {
  waiting: { label: "Waiting", tone: "wait" },
  reading: { label: "Reading", tone: "wait" },
  filed: { label: "Imported", tone: "ok" },
  unreadable: { label: "Unreadable", tone: "bad" },
  duplicate: { label: "Already held", tone: "look" },
  rejected: { label: "Not accepted", tone: "bad" },
  skipped: { label: "Skipped", tone: "look" },
};

const STATE_WORDS: Record<ImportView["state"], string> = {
  proposed: "Waiting for you to confirm where each folder goes",
  importing: "Storing the files",
  reading: "Reading the files stored",
  done: "Finished",
  failed: "Stopped",
};

function FileBadge({ state }: { state: ImportFileState }) {
  const { label, tone } = FILE_STATES[state];
  return (
    <span
      data-state={state}
      className={cn(
        "inline-block whitespace-nowrap rounded px-2 py-0.5 text-xs font-medium",
        tone === "ok" && "bg-verdigris-light text-verdigris-dark",
        tone === "wait" && "bg-paper-deep text-ink-soft",
        tone === "look" && "bg-amber-light text-amber",
        tone === "bad" && "bg-brick-light text-brick",
      )}
    >
      {label}
    </span>
  );
}

type FolderChoice = ImportMapping["folders"][number];

function initialMapping(view: ImportView, defaultMatterId: number | null): { folders: FolderChoice[]; matters: Record<string, number | null>; defaultMatterId: number | null } {
  const folders: FolderChoice[] = view.folders.map((f) =>
    f.type.kind === "existing" ? { name: f.name, action: "existing", cabinetTypeId: f.type.cabinetTypeId } : { name: f.name, action: "new", newName: f.type.name },
  );
  const matters: Record<string, number | null> = {};
  for (const f of view.folders) for (const m of f.matterProposals) matters[m.name] ??= m.matter?.matterId ?? null;
  return { folders, matters, defaultMatterId };
}

function MappingForm({ view, types, matters, onConfirmed }: { view: ImportView; types: Option[]; matters: Option[]; onConfirmed: (v: ImportView) => void }) {
  const [state, setState] = useState(() => initialMapping(view, null));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const matterFolders = Object.keys(state.matters).sort();
  const setFolder = (i: number, choice: FolderChoice) => setState((s) => ({ ...s, folders: s.folders.map((f, j) => (j === i ? choice : f)) }));

  async function confirm() {
    setError(null);
    if (!state.defaultMatterId) return setError("Choose the matter for files that are not in a matter's folder.");
    setBusy(true);
    try {
      const mapping = { folders: state.folders, matters: matterFolders.map((name) => ({ name, matterId: state.matters[name] })), defaultMatterId: state.defaultMatterId };
      onConfirmed(await requestJson<ImportView>(`/api/imports/${view.id}/confirm`, { method: "POST", body: JSON.stringify({ mapping }) }));
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <form
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        void confirm();
      }}
    >
      <div className="overflow-x-auto rounded border border-paper-edge bg-white/70">
        <table className="w-full text-sm" data-testid="import-folders">
          <thead className="bg-paper-deep text-left text-xs text-ink-soft">
            <tr>
              <th className="px-3 py-2 font-medium">Folder found</th>
              <th className="px-3 py-2 font-medium">Files</th>
              <th className="px-3 py-2 font-medium">Goes to</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-paper-edge">
            {view.folders.map((f, i) => {
              const choice = state.folders[i];
              const proposal = f.type.kind === "existing" ? (f.type.match === "exact" ? "Same name" : `Close name (${Math.round(f.type.score * 100)} %)`) : "No cabinet type like it: a new one";
              const value = choice.action === "existing" ? String(choice.cabinetTypeId) : choice.action;
              return (
                <tr key={f.name} data-testid="import-folder" data-folder={f.name}>
                  <td className="px-3 py-2 align-top">
                    <span className="font-medium">{f.name}</span>
                    {f.matters.length > 0 && <span className="block text-xs text-ink-faint">{f.matters.length} matter folder{f.matters.length > 1 ? "s" : ""}</span>}
                  </td>
                  <td className="px-3 py-2 align-top tabular-nums">
                    {f.files} <span className="text-xs text-ink-faint">({formatSize(f.bytes)})</span>
                  </td>
                  <td className="px-3 py-2 align-top">
                    <label className="sr-only" htmlFor={`folder-${i}`}>Where {f.name} goes</label>
                    <select
                      id={`folder-${i}`}
                      className="w-full max-w-xs rounded border border-paper-edge bg-white px-2 py-1"
                      value={value}
                      onChange={(e) => {
                        const v = e.target.value;
                        if (v === "new") setFolder(i, { name: f.name, action: "new", newName: f.type.kind === "new" ? f.type.name : f.name });
                        else if (v === "skip") setFolder(i, { name: f.name, action: "skip" });
                        else setFolder(i, { name: f.name, action: "existing", cabinetTypeId: Number(v) });
                      }}
                    >
                      {types.map((t) => (
                        <option key={t.id} value={t.id}>{t.label}</option>
                      ))}
                      <option value="new">A new cabinet type…</option>
                      <option value="skip">Skip this folder</option>
                    </select>
                    {choice.action === "new" && (
                      <input
                        aria-label={`Name of the new cabinet type for ${f.name}`}
                        className="mt-1 block w-full max-w-xs rounded border border-paper-edge bg-white px-2 py-1"
                        value={choice.newName}
                        onChange={(e) => setFolder(i, { ...choice, newName: e.target.value })}
                      />
                    )}
                    <span className="mt-1 block text-xs text-ink-faint" data-testid="import-proposal">Proposed: {proposal}</span>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      <div className="space-y-2 rounded border border-paper-edge bg-white/70 p-3 text-sm">
        <label className="block font-medium" htmlFor="default-matter">Matter for files not in a matter&apos;s folder</label>
        <select id="default-matter" className="w-full max-w-md rounded border border-paper-edge bg-white px-2 py-1" value={state.defaultMatterId ?? ""} onChange={(e) => setState((s) => ({ ...s, defaultMatterId: e.target.value ? Number(e.target.value) : null }))}>
          <option value="">Choose a matter…</option>
          {matters.map((m) => (
            <option key={m.id} value={m.id}>{m.label}</option>
          ))}
        </select>
        {matterFolders.length > 0 && (
          <div className="space-y-1 pt-2">
            <p className="font-medium">Matter folders</p>
            {matterFolders.map((name) => (
              <div key={name} className="flex flex-wrap items-center gap-2" data-testid="import-matter-folder" data-folder={name}>
                <label htmlFor={`mf-${name}`} className="min-w-40 font-mono text-xs">{name}</label>
                <select id={`mf-${name}`} className="rounded border border-paper-edge bg-white px-2 py-1" value={state.matters[name] ?? ""} onChange={(e) => setState((s) => ({ ...s, matters: { ...s.matters, [name]: e.target.value ? Number(e.target.value) : null } }))}>
                  <option value="">The matter above</option>
                  {matters.map((m) => (
                    <option key={m.id} value={m.id}>{m.label}</option>
                  ))}
                </select>
              </div>
            ))}
          </div>
        )}
      </div>
      {view.looseFiles > 0 && <Notice tone="warning">{view.looseFiles} file{view.looseFiles > 1 ? "s are" : " is"} at the top level, outside any folder: not imported (listed below).</Notice>}
      {error && <Notice tone="error">{error}</Notice>}
      <Button type="submit" disabled={busy}>{busy ? "Confirming…" : `Import ${view.counts.total - view.counts.skipped - view.counts.rejected} files`}</Button>
    </form>
  );
}

function Progress({ view }: { view: ImportView }) {
  const c = view.counts;
  const settled = c.total - c.waiting - c.reading;
  const pct = c.total ? Math.round((settled / c.total) * 100) : 100;
  return (
    <div className="space-y-2" data-testid="import-progress" data-state={view.state}>
      <p className="text-sm">
        <span className="font-medium">{STATE_WORDS[view.state]}</span> — {settled} of {c.total} files settled: {c.filed} imported, {c.unreadable} unreadable, {c.duplicate} already held, {c.rejected} not accepted, {c.skipped} skipped.
      </p>
      <div className="h-1.5 w-full rounded bg-paper-deep" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} aria-label="Files settled">
        <div className="h-1.5 rounded bg-verdigris" style={{ width: `${pct}%` }} />
      </div>
      {view.state === "done" && (
        <Notice tone="info" title="Check a sample before relying on it">
          {c.filed} files are filed as imported, each on the record in your name. {view.modelVersionId ? <>A retraining started: see <Link className="text-verdigris underline" href="/models">Models</Link> for its cross-validated figures.</> : null} Open a few documents of each cabinet type to check them; keep the original folders as the office&apos;s record until you have.
        </Notice>
      )}
      {view.state === "failed" && <Notice tone="error">{view.error}</Notice>}
    </div>
  );
}

export function ImportBoard({ initial, types, matters }: { initial: ImportView; types: Option[]; matters: Option[] }) {
  const [view, setView] = useState(initial);
  const running = view.state === "importing" || view.state === "reading";
  useSWR<ImportView>(running ? `/api/imports/${view.id}` : null, fetcher, { refreshInterval: 1500, onSuccess: setView });
  const problems = view.files.filter((f) => ["unreadable", "duplicate", "rejected", "skipped"].includes(f.state));
  return (
    <div className="space-y-6">
      <p className="text-xs text-ink-faint">
        {view.sourceKind === "zip" ? "Zip" : "Folder"} <span className="font-mono">{view.sourceName}</span>, {formatSize(view.sizeBytes)}, sent by {view.createdBy} on {formatUtc(view.createdAt)} UTC.
      </p>
      {view.state === "proposed" ? <MappingForm view={view} types={types} matters={matters} onConfirmed={setView} /> : <Progress view={view} />}
      {problems.length > 0 && view.state !== "proposed" && (
        <section aria-label="Files that need a look">
          <h2 className="mb-2 font-serif text-lg">Files that need a look ({problems.length})</h2>
          <FileList files={problems} />
        </section>
      )}
      <section aria-label="Every file">
        <h2 className="mb-2 font-serif text-lg">Every file ({view.counts.total})</h2>
        <FileList files={view.files} />
      </section>
    </div>
  );
}

function FileList({ files }: { files: ImportView["files"] }) {
  return (
    <ul className="max-h-[32rem] divide-y divide-paper-edge overflow-y-auto rounded border border-paper-edge bg-white/70" data-testid="import-files">
      {files.map((f) => (
        <li key={f.id} className="px-3 py-2 text-sm" data-testid="import-file" data-path={f.path} data-state={f.state}>
          <div className="flex flex-wrap items-center gap-2">
            <span className="min-w-0 flex-1 break-all font-mono text-xs">{f.path}</span>
            <span className="text-xs text-ink-faint">{formatSize(f.sizeBytes)}</span>
            <FileBadge state={f.state} />
            {f.documentId && (
              <Link className="text-xs text-verdigris underline" href={`/documents/${f.documentId}`}>
                #{f.documentId}
              </Link>
            )}
          </div>
          {f.message && <p className="mt-1 text-xs text-ink-soft">{f.message}</p>}
        </li>
      ))}
    </ul>
  );
}
