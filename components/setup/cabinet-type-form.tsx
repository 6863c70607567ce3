"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { requestJson } from "@/components/ui/request-json";
import { RETENTION_CAUTION } from "@/lib/retention";
import { cabinetTypeSchema, MAX_RETENTION_YEARS, type RetentionTrigger } from "@/lib/validations/setup";
import { described, Field, INPUT } from "./field";
import { FormFooter } from "./form-footer";
import type { CabinetTypeFormValues } from "./form-values";
import { splitList, useSchemaForm } from "./use-schema-form";

interface Props {
  /** The type being edited; none for a new one. */
  id?: number;
  initial: CabinetTypeFormValues;
  /** Issue 11 shows here how many filed documents a retention change affects. */
  retentionImpact?: React.ReactNode;
}

const toInput = (v: CabinetTypeFormValues) => ({
  name: v.name,
  description: v.description,
  keywords: splitList(v.keywords),
  retentionYears: v.retentionTrigger === "permanent" || v.retentionYears.trim() === "" ? null : Number(v.retentionYears),
  retentionTrigger: v.retentionTrigger,
  retentionSource: v.retentionSource,
});

/** Add or edit a cabinet type; checked as you type with the route's own schema. What was typed stays on an error. */
export function CabinetTypeForm({ id, initial, retentionImpact }: Props) {
  const router = useRouter();
  const form = useSchemaForm(cabinetTypeSchema, initial, toInput);
  const [busy, setBusy] = useState(false);
  const [serverError, setServerError] = useState<string | null>(null);
  const { values, set, errors } = form;

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    const input = form.check();
    if (!input) return;
    setBusy(true);
    setServerError(null);
    try {
      const saved = await requestJson<{ id: number; name: string }>(id ? `/api/cabinet-types/${id}` : "/api/cabinet-types", { method: id ? "PATCH" : "POST", body: JSON.stringify(input) });
      router.push(`/setup/cabinet-types?done=${id ? "saved" : "created"}&name=${encodeURIComponent(saved.name)}`, { scroll: false });
      router.refresh();
    } catch (err) {
      setServerError((err as Error).message);
    } finally {
      setBusy(false);
    }
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label={id ? "Edit cabinet type" : "Add a cabinet type"} data-testid="cabinet-type-form">
      <h2 className="font-serif text-lg">{id ? `Edit “${initial.name}”` : "Add a cabinet type"}</h2>
      <Field id="ct-name" label="Name" error={errors.name} hint={id ? "Renaming keeps the old name on every earlier event of the record." : undefined}>
        <input {...described("ct-name", errors.name)} className={INPUT} value={values.name} onChange={(e) => set("name", e.target.value)} autoFocus />
      </Field>
      <Field id="ct-description" label="Description" error={errors.description} hint="What belongs here, in the words the documents use: until it has filed examples, Foldwright ranks the type by this and the keywords.">
        <textarea {...described("ct-description", errors.description)} rows={4} className={INPUT} value={values.description} onChange={(e) => set("description", e.target.value)} />
      </Field>
      <Field id="ct-keywords" label="Keywords (comma-separated)" error={errors.keywords} hint="Words and short phrases that say “this is the type”, e.g. invoice, amount due, receipt.">
        <input {...described("ct-keywords", errors.keywords)} className={INPUT} value={values.keywords} onChange={(e) => set("keywords", e.target.value)} />
      </Field>
      <fieldset className="space-y-2 rounded border border-paper-edge p-3">
        <legend className="px-1 text-xs font-medium text-ink-soft">Retention</legend>
        <div className="flex gap-3">
          <Field id="ct-trigger" label="Starts" error={errors.retentionTrigger} className="flex-1">
            <select {...described("ct-trigger", errors.retentionTrigger)} className={INPUT} value={values.retentionTrigger} onChange={(e) => set("retentionTrigger", e.target.value as RetentionTrigger)}>
              <option value="after_filing">After filing</option>
              <option value="after_matter_close">After the matter closes</option>
              <option value="permanent">Permanent (keep for good)</option>
            </select>
          </Field>
          {values.retentionTrigger !== "permanent" && (
            <Field id="ct-years" label="Years" error={errors.retentionYears} className="w-24">
              <input {...described("ct-years", errors.retentionYears)} type="number" min={1} max={MAX_RETENTION_YEARS} step={1} inputMode="numeric" className={INPUT} value={values.retentionYears} onChange={(e) => set("retentionYears", e.target.value)} />
            </Field>
          )}
        </div>
        <Field id="ct-source" label="Source" error={errors.retentionSource} hint="The rule or body the period comes from; say “common practice” where there is none.">
          <input {...described("ct-source", errors.retentionSource)} className={INPUT} value={values.retentionSource} onChange={(e) => set("retentionSource", e.target.value)} />
        </Field>
        {/* Issue 11: "this change affects N documents" appears here. */}
        <div data-testid="retention-impact">{retentionImpact}</div>
        <p className="text-xs text-ink-faint">{RETENTION_CAUTION}</p>
      </fieldset>
      <FormFooter serverError={serverError} busy={busy} editing={Boolean(id)} addLabel="Add cabinet type" saveTestId="save-cabinet-type" cancelHref="/setup/cabinet-types" />
    </form>
  );
}
