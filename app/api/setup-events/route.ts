import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listSetupEvents, streamSetupEventsCsv } from "@/lib/data/setup-events";
import { setupEventsQuerySchema } from "@/lib/validations/setup";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("history.read", "read the setup record");
  const p = setupEventsQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  if (p.format === "csv") {
    return new Response(streamSetupEventsCsv(user, { entity: p.entity, entityId: p.entityId, limit: p.pageSize }), {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="foldwright-setup-record.csv"` },
    });
  }
  const { items, total } = await listSetupEvents(user, p);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});
