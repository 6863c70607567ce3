import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listCabinetTypes } from "@/lib/data/catalog";
import { createCabinetType } from "@/lib/data/setup-cabinet-types";
import { cabinetTypeSchema, listFlagSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

/** Active types for pickers; `?all=1` includes retired ones (filters still find what is filed there). */
export const GET = handle(async (request: Request) => {
  const user = await requireUser("documents.read", "see cabinet types");
  const { all } = listFlagSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const items = await listCabinetTypes(user, all !== "1");
  return NextResponse.json({ items, total: items.length, page: 1, pageSize: items.length });
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "add cabinet types");
  const input = cabinetTypeSchema.parse(await readJson(request));
  return NextResponse.json(await createCabinetType(user, input), { status: 201 });
});
