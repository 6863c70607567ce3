"use client";
import { SetupError } from "@/components/setup/setup-error";

export default function MattersError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <SetupError title="Clients & matters" error={error} reset={reset} />;
}
