import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { notFound } from "@/lib/errors";
import { requireUser } from "@/lib/data/current-user";
import { getImport } from "@/lib/data/imports";

export const dynamic = "force-dynamic";

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "see imports");
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id <= 0) throw notFound("That import");
  return NextResponse.json(await getImport(user, id));
});
