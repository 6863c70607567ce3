"use client";
import { useCallback, useMemo, useState } from "react";
import { useDropzone } from "react-dropzone";
import useSWR from "swr";
import { uploadFile, type UploadAnswer } from "./upload";
import { StateBadge, type IntakeState } from "./state-badge";
import { RecentIntake } from "./recent-intake";

interface Row {
  key: string;
  name: string;
  size: number;
  progress: number;
  state: IntakeState;
  id?: number;
  message?: string;
}

interface DocState {
  id: number;
  status: "reading" | "ready" | "unreadable";
  reason: string | null;
  restricted?: true;
}

const fetcher = (url: string) => fetch(url).then((r) => (r.ok ? r.json() : Promise.reject(new Error(String(r.status)))));
const PARALLEL_UPLOADS = 3;

function formatSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  const mb = bytes / 1024 / 1024;
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
}

export function IntakeBoard({ maxBytes }: { maxBytes: number }) {
  const [rows, setRows] = useState<Row[]>([]);
  const update = (key: string, patch: Partial<Row>) => setRows((rs) => rs.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  const onDrop = useCallback(async (files: File[]) => {
    const added = files.map((file, i) => ({ key: `${Date.now()}-${i}-${file.name}`, file }));
    const fresh: Row[] = added.map(({ key, file }) => ({ key, name: file.name, size: file.size, progress: 0, state: "queued" }));
    setRows((rs) => [...fresh, ...rs]);
    const queue = [...added];
    const work = async () => {
      for (let next = queue.shift(); next; next = queue.shift()) {
        const { key, file } = next;
        update(key, { state: "uploading" });
        const answer: UploadAnswer = await uploadFile(file, (p) => update(key, { progress: p }));
        if (answer.status === "reading") update(key, { state: "reading", id: answer.id, progress: 1 });
        else if (answer.status === "duplicate") update(key, { state: "duplicate", message: answer.duplicateOf?.message, id: answer.duplicateOf?.id ?? undefined });
        else update(key, { state: "rejected", message: answer.error?.message });
      }
    };
    await Promise.all(Array.from({ length: PARALLEL_UPLOADS }, work));
  }, []);

  const { getRootProps, getInputProps, isDragActive } = useDropzone({ onDrop, multiple: true });

  // Poll the documents still being read until they reach ready or unreadable.
  const readingIds = useMemo(() => rows.filter((r) => r.state === "reading" && r.id).map((r) => r.id!), [rows]);
  useSWR<{ items: DocState[] }>(readingIds.length ? `/api/documents?ids=${readingIds.join(",")}&pageSize=200` : null, fetcher, {
    refreshInterval: 1500,
    onSuccess: (data) =>
      setRows((rs) =>
        rs.map((r) => {
          const doc = r.state === "reading" ? data.items.find((d) => d.id === r.id) : undefined;
          if (!doc || doc.status === "reading") return r;
          return { ...r, state: doc.restricted ? "restricted" : doc.status, message: doc.reason ?? undefined };
        }),
      ),
  });

  return (
    <div className="space-y-6">
      <div
        {...getRootProps()}
        aria-label="Drop zone: drop files here, or press Enter to choose files"
        className={`cursor-pointer rounded-md border-2 border-dashed px-6 py-10 text-center transition-colors ${
          isDragActive ? "border-verdigris bg-verdigris-light/40" : "border-paper-edge bg-white/50 hover:bg-white/80"
        }`}
      >
        <input {...getInputProps()} data-testid="intake-input" />
        <p className="font-medium">{isDragActive ? "Let go to upload" : "Drop files here, or click (or press Enter) to choose"}</p>
        <p className="mt-1 text-xs text-ink-soft">
          PDF, Word (.docx), PNG, JPEG and TIFF, up to {formatSize(maxBytes)} each. Originals are kept exactly as sent.
        </p>
      </div>

      {rows.length > 0 && (
        <section aria-label="This session's uploads">
          <h2 className="mb-2 font-serif text-lg">Just dropped</h2>
          <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/70">
            {rows.map((r) => (
              <li key={r.key} className="px-4 py-2" data-testid="intake-row" data-name={r.name}>
                <div className="flex items-center gap-3 text-sm">
                  <span className="min-w-0 flex-1 truncate font-medium" title={r.name}>{r.name}</span>
                  <span className="text-xs text-ink-faint">{formatSize(r.size)}</span>
                  <StateBadge state={r.state} />
                </div>
                {r.state === "uploading" && (
                  <div className="mt-1 h-1 w-full rounded bg-paper-deep" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(r.progress * 100)} aria-label={`Uploading ${r.name}`}>
                    <div className="h-1 rounded bg-verdigris" style={{ width: `${Math.round(r.progress * 100)}%` }} />
                  </div>
                )}
                {r.message && <p className="mt-1 text-xs text-ink-soft" data-testid="intake-message">{r.message}</p>}
              </li>
            ))}
          </ul>
        </section>
      )}

      <RecentIntake />
    </div>
  );
}
