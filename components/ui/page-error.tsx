"use client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { UNAVAILABLE_SENTENCE, unavailableService } from "@/lib/unavailable";

/**
 * What a page shows when loading it failed. In production the browser gets only the error's
 * digest; a database or document store that is not answering has a digest of its own
 * (lib/unavailable.ts), so the page can say which one and that it clears by itself.
 */
export function PageError({ title, error, reset }: { title: string; error: Error & { digest?: string }; reset: () => void }) {
  const service = unavailableService(error);
  return (
    <section className="max-w-2xl space-y-4">
      <h1 className="font-serif text-2xl">{title}</h1>
      <Notice tone="error" title={`${title} could not be loaded`}>
        {service ? (
          <p>{UNAVAILABLE_SENTENCE[service]}</p>
        ) : (
          <p>
            Foldwright could not read this page just now; nothing was changed. Try again; if it keeps failing, check that the database is running
            (<code className="font-mono">/api/health</code>) or tell your admin{error.digest ? ` (reference ${error.digest})` : ""}.
          </p>
        )}
      </Notice>
      <Button onClick={reset}>Try again</Button>
    </section>
  );
}
