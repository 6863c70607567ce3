"use client";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

/** What a Setup page shows when loading it failed: what happened, that nothing changed, and a retry. */
export function SetupError({ title, error, reset }: { title: string; error: Error & { digest?: string }; reset: () => void }) {
  return (
    <section className="max-w-2xl space-y-4">
      <h1 className="font-serif text-2xl">{title}</h1>
      <Notice tone="error" title={`${title} could not be loaded`}>
        <p>
          Foldwright could not read this page just now; nothing was changed. Try again; if it keeps failing, check that the database is running
          (<code className="font-mono">/api/health</code>) or tell your admin{error.digest ? ` (reference ${error.digest})` : ""}.
        </p>
      </Notice>
      <Button onClick={reset}>Try again</Button>
    </section>
  );
}
