"use client";
import { PageError } from "@/components/ui/page-error";

// Catches what the areas' own boundaries cannot: the sign-in pages and the app's layout (which
// reads the signed-in person, so a database that is not answering fails there first).
export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-2xl p-6">
      <PageError title="Foldwright" error={error} reset={reset} />
    </main>
  );
}
