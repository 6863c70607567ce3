"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/models/request";

export interface SenderView {
  id: number;
  pattern: string;
  kind: "address" | "domain";
  filesAs: { id: number; name: string; email: string };
  note: string | null;
}

const FIELD = "rounded border border-paper-edge bg-white px-2 py-1.5 text-sm";
const TH = "border-b border-paper-edge bg-paper-deep px-2 py-1.5 text-left text-xs font-medium text-ink-soft";

/** Allowed senders of scans by e-mail: add an address or a domain, remove one (asks first). */
export function SendersBoard({ initial, uploaders }: { initial: SenderView[]; uploaders: { id: number; name: string; email: string }[] }) {
  const [senders, setSenders] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [confirmId, setConfirmId] = useState<number | null>(null);

  async function add(form: HTMLFormElement) {
    const data = new FormData(form);
    setError(null);
    try {
      const { sender } = await requestJson<{ sender: SenderView }>("/api/senders", {
        method: "POST",
        body: JSON.stringify({ pattern: data.get("pattern"), filesAsUserId: Number(data.get("filesAs")), note: data.get("note") || undefined }),
      });
      setSenders((list) => [...list, sender].sort((a, b) => a.pattern.localeCompare(b.pattern)));
      form.reset();
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  }

  async function remove(id: number) {
    setError(null);
    try {
      await requestJson(`/api/senders/${id}`, { method: "DELETE" });
      setSenders((list) => list.filter((s) => s.id !== id));
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    } finally {
      setConfirmId(null);
    }
  }

  return (
    <div className="space-y-4">
      <form
        aria-label="Allow a sender"
        className="flex flex-wrap items-end gap-2 rounded border border-paper-edge bg-white/60 p-3"
        onSubmit={(e) => {
          e.preventDefault();
          void add(e.currentTarget);
        }}
      >
        <label className="min-w-0 max-w-full text-sm">
          <span className="mb-1 block font-medium">Address or domain</span>
          <input name="pattern" required placeholder="copier@alderquay.example" className={`${FIELD} w-full sm:w-64`} />
        </label>
        <label className="min-w-0 max-w-full text-sm">
          <span className="mb-1 block font-medium">File as</span>
          <select name="filesAs" required className={`${FIELD} max-w-full`}>
            {uploaders.map((u) => (
              <option key={u.id} value={u.id}>{u.name} ({u.email})</option>
            ))}
          </select>
        </label>
        <label className="min-w-0 max-w-full text-sm">
          <span className="mb-1 block font-medium">Note</span>
          <input name="note" maxLength={200} className={`${FIELD} w-full sm:w-56`} />
        </label>
        <Button type="submit">Allow</Button>
      </form>
      {error && <Notice tone="error" title="Not changed">{error}</Notice>}
      {senders.length === 0 ? (
        <p className="rounded border border-dashed border-paper-edge bg-white/50 px-4 py-3 text-sm text-ink-soft">
          No sender is allowed, so every scan by e-mail is refused. Add the copier&apos;s address or the office&apos;s domain above.
        </p>
      ) : (
        <table className="w-full border-collapse rounded border border-paper-edge bg-white/70 text-sm" data-testid="senders-table">
          <thead>
            <tr>
              <th scope="col" className={TH}>Allowed</th>
              <th scope="col" className={TH}>Kind</th>
              <th scope="col" className={TH}>Filed as (unless the sender is a person)</th>
              <th scope="col" className={TH}>Note</th>
              <th scope="col" className={`${TH} text-right`}>Acts</th>
            </tr>
          </thead>
          <tbody>
            {senders.map((s) => (
              <tr key={s.id} className="border-t border-paper-edge/70">
                <td className="px-2 py-1.5 font-mono text-xs">{s.pattern}</td>
                <td className="px-2 py-1.5">{s.kind === "domain" ? "Whole domain" : "One address"}</td>
                <td className="px-2 py-1.5">{s.filesAs.name}</td>
                <td className="px-2 py-1.5 text-ink-soft">{s.note ?? "–"}</td>
                <td className="px-2 py-1.5 text-right">
                  {confirmId === s.id ? (
                    <span className="inline-flex items-center gap-1">
                      Stop taking scans from {s.pattern}?
                      <Button variant="danger" onClick={() => void remove(s.id)}>Remove</Button>
                      <Button variant="quiet" onClick={() => setConfirmId(null)} autoFocus>Keep</Button>
                    </span>
                  ) : (
                    <Button variant="quiet" onClick={() => setConfirmId(s.id)}>Remove</Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
