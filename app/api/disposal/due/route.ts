import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listDue } from "@/lib/data/disposal";
import { RETENTION_CAUTION } from "@/lib/retention";
import { dueListSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

/** Filed documents past their retention date and under no hold. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser("disposal.read", "see the disposal list");
  const p = dueListSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listDue(user, p);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize, caution: RETENTION_CAUTION });
});
