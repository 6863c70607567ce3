import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { notFound } from "@/lib/errors";
import { requireUser } from "@/lib/data/current-user";
import { confirmImport } from "@/lib/data/imports";
import { confirmImportSchema } from "@/lib/validations/imports";

export const dynamic = "force-dynamic";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("setup.manage", "import an archive");
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id <= 0) throw notFound("That import");
  const { mapping } = confirmImportSchema.parse(await readJson(request));
  return NextResponse.json(await confirmImport(user, id, mapping), { status: 202 });
});
