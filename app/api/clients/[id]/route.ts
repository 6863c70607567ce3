import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { updateClient } from "@/lib/data/setup-clients";
import { notFound } from "@/lib/errors";
import { clientPatchSchema, idSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

export const PATCH = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "change clients");
  const id = idSchema.safeParse((await params).id);
  if (!id.success) throw notFound("That client");
  const patch = clientPatchSchema.parse(await readJson(request));
  return NextResponse.json(await updateClient(user, id.data, patch));
});
