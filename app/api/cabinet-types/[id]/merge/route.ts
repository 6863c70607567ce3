import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { mergeCabinetType } from "@/lib/data/setup-cabinet-types";
import { notFound } from "@/lib/errors";
import { idSchema, mergeSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

/** Moves every document filed in this type into `intoId` (each move on the record, reason "merged") and retires this type. */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "merge cabinet types");
  const id = idSchema.safeParse((await params).id);
  if (!id.success) throw notFound("That cabinet type");
  const { intoId } = mergeSchema.parse(await readJson(request));
  return NextResponse.json(await mergeCabinetType(user, id.data, intoId));
});
