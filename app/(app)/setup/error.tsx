"use client";
import { SetupError } from "@/components/setup/setup-error";

export default function SetupIndexError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <SetupError title="Setup" error={error} reset={reset} />;
}
