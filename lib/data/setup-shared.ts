import "server-only";
// Small pieces the Setup writers share: JSON columns, duplicate-key errors, day strings.
export const parseJson = <T>(v: unknown, fallback: T): T => (v === null || v === undefined ? fallback : typeof v === "string" ? (JSON.parse(v) as T) : (v as T));

/** MariaDB's duplicate-key error: the unique index caught what a check raced past. */
export const isDuplicateKey = (e: unknown) => typeof e === "object" && e !== null && (e as { code?: string }).code === "ER_DUP_ENTRY";

/** A DATE column as YYYY-MM-DD (the connection runs in UTC, so mysql2 gives UTC midnight). */
export function toDay(v: unknown): string | null {
  if (v === null || v === undefined) return null;
  if (typeof v === "string") return v.slice(0, 10);
  return (v as Date).toISOString().slice(0, 10);
}

/** The fields of `after` whose values differ from `before`: what a "changed" event records. */
export function changedFields<T extends Record<string, unknown>>(before: T, after: T): { before: Partial<T>; after: Partial<T> } {
  const b: Partial<T> = {};
  const a: Partial<T> = {};
  for (const key of Object.keys(after) as (keyof T)[]) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) {
      b[key] = before[key];
      a[key] = after[key];
    }
  }
  return { before: b, after: a };
}
