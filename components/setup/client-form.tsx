"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { requestJson } from "@/components/ui/request-json";
import { clientSchema } from "@/lib/validations/setup";
import { described, Field, INPUT } from "./field";
import { FormFooter } from "./form-footer";
import type { ClientFormValues } from "./form-values";
import { splitList, useSchemaForm } from "./use-schema-form";

const toInput = (v: ClientFormValues) => ({ name: v.name, aliases: splitList(v.aliases), emailDomains: splitList(v.emailDomains), taxIdLast4: v.taxIdLast4.trim() === "" ? null : v.taxIdLast4 });

/** Add or edit a client; checked as you type with the route's schema. Only the tax ID's last four digits are ever taken. */
export function ClientForm({ id, initial }: { id?: number; initial: ClientFormValues }) {
  const router = useRouter();
  const form = useSchemaForm(clientSchema, initial, toInput);
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
      const saved = await requestJson<{ id: number; name: string }>(id ? `/api/clients/${id}` : "/api/clients", { method: id ? "PATCH" : "POST", body: JSON.stringify(input) });
      router.push(`/setup/matters?done=${id ? "client-saved" : "client-created"}&name=${encodeURIComponent(saved.name)}`, { scroll: false });
      router.refresh();
    } catch (err) {
      setServerError((err as Error).message);
    } finally {
      setBusy(false);
    }
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label={id ? "Edit client" : "Add a client"} data-testid="client-form">
      <h2 className="font-serif text-lg">{id ? `Edit “${initial.name}”` : "Add a client"}</h2>
      <Field id="cl-name" label="Name" error={errors.name}>
        <input {...described("cl-name", errors.name)} className={INPUT} value={values.name} onChange={(e) => set("name", e.target.value)} autoFocus />
      </Field>
      <Field id="cl-aliases" label="Aliases (comma-separated)" error={errors.aliases} hint="Other names the client's papers use: a trading name, initials, a former name.">
        <input {...described("cl-aliases", errors.aliases)} className={INPUT} value={values.aliases} onChange={(e) => set("aliases", e.target.value)} />
      </Field>
      <Field id="cl-domains" label="E-mail domains (comma-separated)" error={errors.emailDomains} hint="e.g. heronboats.example: a document from that domain points to this client.">
        <input {...described("cl-domains", errors.emailDomains)} className={INPUT} value={values.emailDomains} onChange={(e) => set("emailDomains", e.target.value)} />
      </Field>
      <Field id="cl-tax" label="Tax ID, last four digits only" error={errors.taxIdLast4} hint="Never type the whole number: Foldwright keeps only the last four to recognise the client's papers.">
        <input {...described("cl-tax", errors.taxIdLast4)} className={`${INPUT} w-24 font-mono`} inputMode="numeric" autoComplete="off" value={values.taxIdLast4} onChange={(e) => set("taxIdLast4", e.target.value)} />
      </Field>
      <FormFooter serverError={serverError} busy={busy} editing={Boolean(id)} addLabel="Add client" saveTestId="save-client" cancelHref="/setup/matters" />
    </form>
  );
}
