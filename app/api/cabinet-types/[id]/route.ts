import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { updateCabinetType } from "@/lib/data/setup-cabinet-types";
import { notFound } from "@/lib/errors";
import { cabinetTypePatchSchema, idSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

/** Any field; `active: false` retires the type (it leaves pickers and suggestions), `true` restores it. */
export const PATCH = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "change cabinet types");
  const id = idSchema.safeParse((await params).id);
  if (!id.success) throw notFound("That cabinet type");
  const patch = cabinetTypePatchSchema.parse(await readJson(request));
  return NextResponse.json(await updateCabinetType(user, id.data, patch));
});
