import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { countQueueByType, listQueue, type QueueFilters } from "@/lib/data/review";
import { queueSchema } from "@/lib/validations/filing";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("filing.decide", "work the To review queue");
  const p = queueSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const filters: QueueFilters = {
    list: p.list,
    sort: p.sort,
    dir: p.dir,
    cabinetTypeId: p.cabinetType,
    matterId: p.matter,
    minConfidence: p.minConfidence,
    maxConfidence: p.maxConfidence,
    q: p.q || undefined,
    page: p.page,
    pageSize: p.pageSize,
  };
  const [{ items, total }, byType] = await Promise.all([listQueue(user, filters), countQueueByType(user, filters)]);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize, byType });
});
