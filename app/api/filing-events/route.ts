import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listFilingEvents, streamFilingEventsCsv, toCsv } from "@/lib/data/filing-record";
import { eventsSchema } from "@/lib/validations/filing";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("history.read", "read the filing record");
  const params = new URL(request.url).searchParams;
  const p = eventsSchema.parse(Object.fromEntries(params));
  const filters = { action: p.action, documentId: p.document, from: p.from, to: p.to };
  // CSV without page or pageSize: the whole record the filters match, streamed (never built in memory).
  if (p.format === "csv" && !params.has("page") && !params.has("pageSize")) {
    return new Response(streamFilingEventsCsv(user, filters), {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="foldwright-filing-record.csv"` },
    });
  }
  const { items, total } = await listFilingEvents(user, { action: p.action, documentId: p.document, from: p.from, to: p.to, page: p.page, pageSize: p.pageSize });
  if (p.format === "csv") {
    return new Response(toCsv(items), {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="foldwright-filing-record.csv"`, "x-total-count": String(total) },
    });
  }
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});
