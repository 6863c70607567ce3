"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { requestJson } from "@/components/ui/request-json";
import { matterSchema } from "@/lib/validations/setup";
import { described, Field, INPUT } from "./field";
import { FormFooter } from "./form-footer";
import { todayUtc, type MatterFormValues } from "./form-values";
import { useSchemaForm } from "./use-schema-form";

export interface Person {
  id: number;
  name: string;
  email: string;
  role: string;
}

interface Props {
  id?: number;
  initial: MatterFormValues;
  clients: { id: number; name: string }[];
  people: Person[];
  /** Issue 11 shows here how many documents a closing date changes the retention of. */
  retentionImpact?: React.ReactNode;
}


const toInput = (v: MatterFormValues) => ({
  clientId: v.clientId ? Number(v.clientId) : undefined,
  number: v.number,
  title: v.title,
  openedOn: v.openedOn,
  status: v.status,
  closedOn: v.status === "closed" ? v.closedOn || null : null,
  restricted: v.restricted,
  team: v.team,
});

/**
 * Add or edit a matter and its team. Closing asks for the date (retention after close runs from
 * it); saving a team with people removed asks first, since on a restricted matter they lose
 * access from their next request.
 */
export function MatterForm({ id, initial, clients, people, retentionImpact }: Props) {
  const router = useRouter();
  const form = useSchemaForm(matterSchema, initial, toInput);
  const [busy, setBusy] = useState(false);
  const [serverError, setServerError] = useState<string | null>(null);
  const [confirming, setConfirming] = useState(false);
  const { values, set, errors } = form;
  const removed = people.filter((p) => initial.team.includes(p.id) && !values.team.includes(p.id));

  const save = async () => {
    const input = form.check();
    if (!input) return setConfirming(false);
    setBusy(true);
    setServerError(null);
    try {
      const saved = await requestJson<{ id: number; number: string }>(id ? `/api/matters/${id}` : "/api/matters", { method: id ? "PATCH" : "POST", body: JSON.stringify(input) });
      setConfirming(false);
      router.push(`/setup/matters?done=${id ? "matter-saved" : "matter-created"}&name=${encodeURIComponent(saved.number)}`, { scroll: false });
      router.refresh();
    } catch (err) {
      setServerError((err as Error).message);
      setConfirming(false);
    } finally {
      setBusy(false);
    }
  };
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    if (!form.check()) return;
    if (removed.length) setConfirming(true);
    else void save();
  };
  const toggle = (personId: number, on: boolean) => set("team", on ? [...values.team, personId] : values.team.filter((x) => x !== personId));
  const setStatus = (status: "open" | "closed") => {
    set("status", status);
    if (status === "closed" && !values.closedOn) set("closedOn", todayUtc());
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label={id ? "Edit matter" : "Add a matter"} data-testid="matter-form">
      <h2 className="font-serif text-lg">{id ? `Edit ${initial.number}` : "Add a matter"}</h2>
      <Field id="mt-client" label="Client" error={errors.clientId} hint={clients.length === 0 ? "Add the client first (Add client, above)." : undefined}>
        <select {...described("mt-client", errors.clientId)} className={INPUT} value={values.clientId} onChange={(e) => set("clientId", e.target.value)}>
          <option value="">Choose the client…</option>
          {clients.map((c) => (
            <option key={c.id} value={c.id}>{c.name}</option>
          ))}
        </select>
      </Field>
      <div className="flex gap-3">
        <Field id="mt-number" label="Number" error={errors.number} className="w-40">
          <input {...described("mt-number", errors.number)} className={`${INPUT} font-mono`} value={values.number} onChange={(e) => set("number", e.target.value)} />
        </Field>
        <Field id="mt-title" label="Title" error={errors.title} className="flex-1">
          <input {...described("mt-title", errors.title)} className={INPUT} value={values.title} onChange={(e) => set("title", e.target.value)} />
        </Field>
      </div>
      <div className="flex flex-wrap gap-3">
        <Field id="mt-opened" label="Opened" error={errors.openedOn}>
          <input {...described("mt-opened", errors.openedOn)} type="date" className={INPUT} value={values.openedOn} onChange={(e) => set("openedOn", e.target.value)} />
        </Field>
        <Field id="mt-status" label="Status" error={errors.status}>
          <select {...described("mt-status", errors.status)} className={INPUT} value={values.status} onChange={(e) => setStatus(e.target.value as "open" | "closed")}>
            <option value="open">Open</option>
            <option value="closed">Closed</option>
          </select>
        </Field>
        {values.status === "closed" && (
          <Field id="mt-closed" label="Closed on" error={errors.closedOn} hint="Retention after close runs from this day.">
            <input {...described("mt-closed", errors.closedOn)} type="date" className={INPUT} value={values.closedOn} onChange={(e) => set("closedOn", e.target.value)} />
          </Field>
        )}
      </div>
      {/* Issue 11: "this change affects N documents" appears here. */}
      <div data-testid="retention-impact">{retentionImpact}</div>
      <fieldset className="space-y-2 rounded border border-paper-edge p-3">
        <legend className="px-1 text-xs font-medium text-ink-soft">Who may see it</legend>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" checked={values.restricted} onChange={(e) => set("restricted", e.target.checked)} data-testid="mt-restricted" />
          <span>
            Restricted (an ethical wall)
            <span className="block text-xs text-ink-soft">Only the team below and admins see anything of it — names, counts, documents, events — from their next request on.</span>
          </span>
        </label>
        <p className="text-xs font-medium text-ink-soft">Team</p>
        <ul className="max-h-48 space-y-1 overflow-auto" data-testid="mt-team">
          {people.map((p) => (
            <li key={p.id}>
              <label className="flex items-center gap-2 text-sm">
                <input type="checkbox" checked={values.team.includes(p.id)} onChange={(e) => toggle(p.id, e.target.checked)} data-email={p.email} />
                {p.name} <span className="text-xs text-ink-faint">{p.role} · {p.email}</span>
              </label>
            </li>
          ))}
        </ul>
        {errors.team && <p className="text-xs text-brick">{errors.team}</p>}
      </fieldset>
      <FormFooter serverError={serverError} busy={busy} editing={Boolean(id)} addLabel="Add matter" saveTestId="save-matter" cancelHref="/setup/matters" />
      <ConfirmDialog open={confirming} title={`Remove ${removed.length === 1 ? removed[0].name : `${removed.length} people`} from the team?`} confirmLabel="Save and remove" busy={busy} error={null} onConfirm={save} onCancel={() => setConfirming(false)}>
        <p>{removed.map((p) => p.name).join(", ")} will leave the team of {values.number || "this matter"}.</p>
        <p>{values.restricted ? "The matter is restricted: they lose sight of it and its documents on their next request." : "The matter is not restricted, so they still see it as everyone in the office does."} You can add them back later; both changes stay on the setup record.</p>
      </ConfirmDialog>
    </form>
  );
}
