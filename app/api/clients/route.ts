import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { createClient, listClients } from "@/lib/data/setup-clients";
import { clientSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  const user = await requireUser("documents.read", "see clients");
  const items = await listClients(user);
  return NextResponse.json({ items, total: items.length, page: 1, pageSize: items.length });
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "add clients");
  const input = clientSchema.parse(await readJson(request));
  return NextResponse.json(await createClient(user, input), { status: 201 });
});
