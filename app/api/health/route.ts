import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/data/health";
import { RETRY_AFTER_SECONDS } from "@/lib/http";
import { UNAVAILABLE_CODE, UNAVAILABLE_SENTENCE } from "@/lib/unavailable";

// Public on purpose (load balancers ask it): it says only whether each service answers.
export const dynamic = "force-dynamic";

export async function GET() {
  const status = await checkHealth();
  if (status.database === "ok" && status.storage === "ok") return NextResponse.json({ ok: true, ...status });
  const service = status.database === "ok" ? "storage" : "database";
  return NextResponse.json(
    { ok: false, ...status, error: { code: UNAVAILABLE_CODE[service], message: UNAVAILABLE_SENTENCE[service] } },
    { status: 503, headers: { "Retry-After": String(RETRY_AFTER_SECONDS) } },
  );
}
