import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { createMatter, listMatters } from "@/lib/data/setup-matters";
import { matterSchema, pageSchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

/** The matters the wall lets this user see; teams only for admins. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser("documents.read", "see matters");
  const p = pageSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listMatters(user, p);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "add matters");
  const input = matterSchema.parse(await readJson(request));
  return NextResponse.json(await createMatter(user, input), { status: 201 });
});
