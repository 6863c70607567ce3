import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listQueue } from "@/lib/data/review";
import { queueSchema } from "@/lib/validations/filing";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("filing.decide", "work the To review queue");
  const p = queueSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listQueue(user, {
    list: p.list,
    sort: p.sort,
    dir: p.dir,
    cabinetTypeId: p.cabinetType,
    matterId: p.matter,
    minConfidence: p.minConfidence,
    maxConfidence: p.maxConfidence,
    page: p.page,
    pageSize: p.pageSize,
  });
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});
