"use client";
import { PageError } from "@/components/ui/page-error";

export default function AppAreaError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <PageError title="This page" error={error} reset={reset} />;
}
