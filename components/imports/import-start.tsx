"use client";
import { useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { archiveFromDrop, archiveFromInput, archiveSize, sendArchive, type Archive } from "./send-archive";
import { formatSize } from "@/components/document/format";

/** Choose or drop a zip or a folder; it is sent at once, then the import's page proposes the mapping. */
export function ImportStart() {
  const router = useRouter();
  const zipInput = useRef<HTMLInputElement>(null);
  const folderInput = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const [sending, setSending] = useState<{ name: string; size: number; progress: number } | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function send(archive: Archive | { error: string }) {
    if ("error" in archive) return setError(archive.error);
    setError(null);
    const name = archive.kind === "zip" ? archive.file.name : archive.name;
    setSending({ name, size: archiveSize(archive), progress: 0 });
    const answer = await sendArchive(archive, (progress) => setSending((s) => (s ? { ...s, progress } : s)));
    if ("id" in answer) router.push(`/setup/import/${answer.id}`);
    else {
      setSending(null);
      setError(answer.error);
    }
  }

  const pct = sending ? Math.round(sending.progress * 100) : 0;
  return (
    <div className="space-y-3">
      <div
        data-testid="import-drop"
        onDragOver={(e) => {
          e.preventDefault();
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setOver(false);
          void archiveFromDrop(e.dataTransfer.items).then(send);
        }}
        className={`rounded-md border-2 border-dashed px-4 py-8 text-center ${over ? "border-verdigris bg-verdigris-light/40" : "border-paper-edge bg-white/50"}`}
      >
        <p className="font-medium">Drop the archive&apos;s zip, or the folder itself, here</p>
        <p className="mt-1 text-xs text-ink-soft">Its top-level folders are cabinet types; a second level may be matter numbers. Nothing is filed until you confirm.</p>
        <div className="mt-3 flex flex-wrap justify-center gap-2">
          <Button type="button" onClick={() => zipInput.current?.click()} disabled={Boolean(sending)}>
            Choose a zip
          </Button>
          <Button type="button" variant="quiet" onClick={() => folderInput.current?.click()} disabled={Boolean(sending)}>
            Choose a folder
          </Button>
        </div>
        <input ref={zipInput} type="file" accept=".zip,application/zip" className="sr-only" tabIndex={-1} aria-label="Zip of the archive" data-testid="import-zip-input" onChange={(e) => e.target.files?.[0] && void send({ kind: "zip", file: e.target.files[0] })} />
        <input
          ref={folderInput}
          type="file"
          className="sr-only"
          tabIndex={-1}
          aria-label="Folder of the archive"
          data-testid="import-folder-input"
          {...({ webkitdirectory: "", directory: "" } as Record<string, string>)}
          onChange={(e) => e.target.files && void send(archiveFromInput(e.target.files))}
        />
      </div>
      {sending && (
        <div role="status" className="text-sm">
          <p>
            Sending <span className="font-medium">{sending.name}</span> ({formatSize(sending.size)}): {pct} %
          </p>
          <div className="mt-1 h-1 w-full rounded bg-paper-deep" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} aria-label={`Sending ${sending.name}`}>
            <div className="h-1 rounded bg-verdigris" style={{ width: `${pct}%` }} />
          </div>
        </div>
      )}
      {error && <Notice tone="error">{error}</Notice>}
    </div>
  );
}
