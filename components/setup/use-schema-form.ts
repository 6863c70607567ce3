"use client";
// Form state checked as you type with the same zod schema the route uses. A field's sentence
// shows once the field was touched (or a save was tried), so an empty form does not shout.
import { useMemo, useState } from "react";
import type { z } from "zod";

export type FieldErrors = Record<string, string>;

/** The first sentence for each top-level field of a failed parse. */
export function errorsOf(error: z.ZodError | undefined): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error?.issues ?? []) {
    const key = String(issue.path[0] ?? "_form");
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

export function useSchemaForm<S extends z.ZodType, V extends object>(schema: S, initial: V, toInput: (values: V) => unknown) {
  const [values, setValues] = useState<V>(initial);
  const [touched, setTouched] = useState<Record<string, boolean>>({});
  const [tried, setTried] = useState(false);
  const parsed = useMemo(() => schema.safeParse(toInput(values)), [schema, toInput, values]);
  const all = parsed.success ? {} : errorsOf(parsed.error);
  const shown: FieldErrors = Object.fromEntries(Object.entries(all).filter(([k]) => tried || touched[k] || k === "_form"));
  return {
    values,
    set: <K extends keyof V>(key: K, value: V[K]) => {
      setValues((v) => ({ ...v, [key]: value }));
      setTouched((t) => ({ ...t, [key as string]: true }));
    },
    errors: shown,
    /** Marks every field shown; returns the parsed input when it is valid. */
    check: (): z.output<S> | null => {
      setTried(true);
      return parsed.success ? parsed.data : null;
    },
  };
}

/** "a, b ,, c" → ["a", "b", "c"]: lists are typed as comma-separated text. */
export const splitList = (s: string) =>
  s
    .split(",")
    .map((x) => x.trim())
    .filter(Boolean);
