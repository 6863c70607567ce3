// "A service Foldwright needs is not answering": the database or the document store. Such an
// error is stamped with a digest where it happens (db/timed-client.ts, storage/s3.ts), so route
// handlers answer 503 with a sentence and page error boundaries — which in production receive
// only the error's digest — can still say what happened. Pure: client components import it.
export type Service = "database" | "storage";

const DIGESTS: Record<Service, string> = {
  database: "FOLDWRIGHT_DATABASE_UNAVAILABLE",
  storage: "FOLDWRIGHT_STORAGE_UNAVAILABLE",
};

export const UNAVAILABLE_SENTENCE: Record<Service, string> = {
  database: "The database is not answering, so Foldwright could not do this. Nothing was changed; try again in a minute, and tell your admin if it keeps happening.",
  storage: "The document store is not answering, so Foldwright could not do this. Nothing was changed; try again in a minute, and tell your admin if it keeps happening.",
};

export const UNAVAILABLE_CODE: Record<Service, string> = {
  database: "database_unavailable",
  storage: "storage_unavailable",
};

/** Marks an error as "this service is not answering" (keeps an earlier mark). */
export function markUnavailable<E>(e: E, service: Service): E {
  if (typeof e === "object" && e !== null && !(e as { digest?: string }).digest) {
    (e as { digest?: string }).digest = DIGESTS[service];
  }
  return e;
}

/** The service an error says is not answering, from its digest; null for every other error. */
export function unavailableService(e: unknown): Service | null {
  const digest = typeof e === "object" && e !== null ? (e as { digest?: unknown }).digest : undefined;
  if (digest === DIGESTS.database) return "database";
  if (digest === DIGESTS.storage) return "storage";
  return null;
}
