import { NextResponse } from "next/server";
import { z } from "zod";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getModelVersion, promoteModelVersion } from "@/lib/data/models";

/** Makes a finished version current: a candidate, or an older version to roll back to. */
export const POST = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("models.manage", "promote or roll back models");
  const id = z.coerce.number().int().positive().parse((await params).id);
  await promoteModelVersion(id, user.id, `Made current by ${user.name}.`);
  return NextResponse.json({ version: await getModelVersion(user, id) });
});
