"use client";
import { useState } from "react";
import { Notice } from "@/components/ui/notice";
import { requestJson } from "@/components/models/request";

export interface NoticeSettingsView {
  digest: boolean;
  retrainAlerts: boolean;
  scanReceipts: boolean;
}

interface Switch {
  key: keyof NoticeSettingsView;
  label: string;
  help: string;
}

/** One checkbox per notice; each change is saved at once. */
export function NoticeSwitches({ initial, switches }: { initial: NoticeSettingsView; switches: Switch[] }) {
  const [settings, setSettings] = useState(initial);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  async function toggle(key: keyof NoticeSettingsView, value: boolean) {
    setError(null);
    setSaved(false);
    try {
      const { notices } = await requestJson<{ notices: NoticeSettingsView }>("/api/profile/notices", { method: "PATCH", body: JSON.stringify({ [key]: value }) });
      setSettings(notices);
      setSaved(true);
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  }

  return (
    <fieldset className="space-y-3 rounded border border-paper-edge bg-white/60 p-4">
      <legend className="px-1 font-medium">E-mail notices</legend>
      {switches.map((s) => (
        <label key={s.key} className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1 accent-verdigris" checked={settings[s.key]} onChange={(e) => void toggle(s.key, e.target.checked)} data-testid={`notice-${s.key}`} />
          <span>
            <span className="font-medium">{s.label}</span>
            <span className="block text-ink-soft">{s.help}</span>
          </span>
        </label>
      ))}
      <div aria-live="polite">
        {saved && <p className="text-xs text-ink-faint">Saved.</p>}
        {error && <Notice tone="error" title="Not saved">{error}</Notice>}
      </div>
    </fieldset>
  );
}
