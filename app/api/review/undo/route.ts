import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { undoFilingEvents } from "@/lib/data/filing-undo";
import { undoManySchema } from "@/lib/validations/filing";

/** Undoes several decisions at once (the Undo of "Accept selected"); one answer per decision. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("filing.decide", "undo filing decisions");
  const { eventIds } = undoManySchema.parse(await readJson(request));
  const results = await undoFilingEvents(user, eventIds);
  return NextResponse.json({ results, undone: results.filter((r) => r.ok).length });
});
