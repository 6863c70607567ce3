import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listCabinetTypes } from "@/lib/data/catalog";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const user = await requireUser("documents.read", "see cabinet types");
  const items = await listCabinetTypes(user);
  return NextResponse.json({ items, total: items.length, page: 1, pageSize: items.length });
});
