"use client";
import { SetupError } from "@/components/setup/setup-error";

export default function CabinetTypesError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <SetupError title="Cabinet types" error={error} reset={reset} />;
}
