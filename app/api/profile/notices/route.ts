import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getNoticeSettings, setNoticeSettings } from "@/lib/data/notices";
import { noticesSchema } from "@/lib/validations/people";

export const dynamic = "force-dynamic";

/** The signed-in person's own notices (every role). */
export const GET = handle(async () => {
  const user = await requireUser();
  return NextResponse.json({ notices: await getNoticeSettings(user) });
});

export const PATCH = handle(async (request: Request) => {
  const user = await requireUser();
  const change = noticesSchema.parse(await readJson(request));
  return NextResponse.json({ notices: await setNoticeSettings(user, change) });
});
