import { NextResponse } from "next/server";
import { z } from "zod";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { releaseHold } from "@/lib/data/holds";
import { releaseHoldSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("holds.place", "lift legal holds");
  const id = z.coerce.number().int().positive("A hold id is a positive whole number.").parse((await params).id);
  const { reason } = releaseHoldSchema.parse(await readJson(request));
  return NextResponse.json({ hold: await releaseHold(user, id, reason) });
});
