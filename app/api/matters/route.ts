import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listVisibleMatters } from "@/lib/data/catalog";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const user = await requireUser("documents.read", "see matters");
  const items = (await listVisibleMatters(user)).map(({ id, number, title, clientName, status, restricted }) => ({ id, number, title, clientName, status, restricted }));
  return NextResponse.json({ items, total: items.length, page: 1, pageSize: items.length });
});
