import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/data/health";

// Public on purpose (load balancers ask it): it says only whether each service answers.
export const dynamic = "force-dynamic";

export async function GET() {
  const status = await checkHealth();
  const ok = status.database === "ok" && status.storage === "ok";
  return NextResponse.json({ ok, ...status }, { status: ok ? 200 : 503 });
}
