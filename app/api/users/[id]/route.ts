import { NextResponse } from "next/server";
import { z } from "zod";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { changePerson } from "@/lib/data/people";
import { changePersonSchema } from "@/lib/validations/people";

/** A change of role or active state; it takes effect on the person's next request. */
export const PATCH = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const admin = await requireUser("setup.manage", "change people's roles or accounts");
  const id = z.coerce.number().int().positive().parse((await params).id);
  const change = changePersonSchema.parse(await readJson(request));
  return NextResponse.json({ person: await changePerson(admin, id, change) });
});
