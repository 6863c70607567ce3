import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listFilingEvents, toCsv } from "@/lib/data/filing-record";
import { eventsSchema } from "@/lib/validations/filing";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("history.read", "read the filing record");
  const p = eventsSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listFilingEvents(user, { action: p.action, documentId: p.document, from: p.from, to: p.to, page: p.page, pageSize: p.pageSize });
  if (p.format === "csv") {
    return new Response(toCsv(items), {
      headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="foldwright-filing-record.csv"`, "x-total-count": String(total) },
    });
  }
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});
