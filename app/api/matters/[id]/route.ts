import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { updateMatter } from "@/lib/data/setup-matters";
import { notFound } from "@/lib/errors";
import { idSchema, matterPatchSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

/** Any field; `team` is the whole new team. Restricting or removing someone works from their next request. */
export const PATCH = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "change matters");
  const id = idSchema.safeParse((await params).id);
  if (!id.success) throw notFound("That matter");
  const patch = matterPatchSchema.parse(await readJson(request));
  return NextResponse.json(await updateMatter(user, id.data, patch));
});
