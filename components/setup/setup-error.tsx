"use client";
import { PageError } from "@/components/ui/page-error";

/** What a Setup page shows when loading it failed: what happened, that nothing changed, and a retry. */
export function SetupError({ title, error, reset }: { title: string; error: Error & { digest?: string }; reset: () => void }) {
  return <PageError title={title} error={error} reset={reset} />;
}
