import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listModelVersions } from "@/lib/data/models";
import { getOfficeSettings } from "@/lib/data/settings";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const user = await requireUser("models.read", "see model versions");
  const [versions, settings] = await Promise.all([listModelVersions(user), getOfficeSettings(user)]);
  return NextResponse.json({
    versions,
    current: versions.find((v) => v.status === "current")?.id ?? null,
    training: versions.find((v) => v.status === "training") ?? null,
    settings,
  });
});
