"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { requestJson } from "@/components/ui/request-json";

/** After a retire or merge: the model still knows the old types until it is retrained. */
export function RetrainOffer({ what }: { what: string }) {
  const [state, setState] = useState<"idle" | "busy" | "started">("idle");
  const [error, setError] = useState<string | null>(null);
  const retrain = async () => {
    setState("busy");
    setError(null);
    try {
      await requestJson("/api/models/retrain", { method: "POST" });
      setState("started");
    } catch (e) {
      setError((e as Error).message);
      setState("idle");
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-3 rounded border-l-4 border-verdigris bg-verdigris-light/50 px-4 py-3 text-sm" role="status" data-testid="retrain-offer">
      <p className="flex-1">
        {what} Retired types are never suggested from now on; retraining lets the model learn the new arrangement of what is filed.
      </p>
      {state === "started" ? (
        <p>
          Retraining started. Follow it on <Link href="/models" className="text-verdigris underline">Models</Link>.
        </p>
      ) : (
        <Button onClick={retrain} disabled={state === "busy"} data-testid="retrain-offer-button">
          {state === "busy" ? "Asking…" : "Retrain now"}
        </Button>
      )}
      {error && <p role="alert" className="w-full text-xs text-brick">{error}</p>}
    </div>
  );
}
