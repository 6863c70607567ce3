import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listHolds, placeHold } from "@/lib/data/holds";
import { holdListSchema, placeHoldSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("holds.read", "see legal holds");
  const p = holdListSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listHolds(user, p);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});

/** A partner on the matter or an admin places a hold on a matter or one document. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("holds.place", "place legal holds");
  const input = placeHoldSchema.parse(await readJson(request));
  return NextResponse.json({ hold: await placeHold(user, input) }, { status: 201 });
});
