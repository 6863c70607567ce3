import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { createClient, listClients } from "@/lib/data/setup-clients";
import { clientSchema, pageSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("documents.read", "see clients");
  const p = pageSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const all = await listClients(user);
  // An office has tens or hundreds of clients: one query, paged here.
  const items = all.slice((p.page - 1) * p.pageSize, p.page * p.pageSize);
  return NextResponse.json({ items, total: all.length, page: p.page, pageSize: p.pageSize });
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "add clients");
  const input = clientSchema.parse(await readJson(request));
  return NextResponse.json(await createClient(user, input), { status: 201 });
});
