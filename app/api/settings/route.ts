import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getOfficeSettings, updateOfficeSettings } from "@/lib/data/settings";
import { settingsSchema } from "@/lib/validations/filing";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const user = await requireUser("models.read", "see the office settings");
  return NextResponse.json({ settings: await getOfficeSettings(user) });
});

export const PATCH = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "change the auto-file policy");
  const patch = settingsSchema.parse(await readJson(request));
  return NextResponse.json({ settings: await updateOfficeSettings(user, patch) });
});
