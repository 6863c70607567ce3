import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { fileDocument } from "@/lib/data/filing";
import { undoFilingEvent } from "@/lib/data/filing-undo";
import { badInput } from "@/lib/errors";
import { documentIdSchema } from "@/lib/validations/documents";
import { filingSchema } from "@/lib/validations/filing";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("filing.decide", "file documents");
  const id = documentIdSchema.parse((await params).id);
  const { action, eventId, ...input } = filingSchema.parse(await readJson(request));
  if (action === "undo") {
    if (!eventId) throw badInput("Name the decision to undo (eventId, from the answer that filed the document).");
    return NextResponse.json({ undo: await undoFilingEvent(user, id, eventId, input.reason) });
  }
  return NextResponse.json({ filing: await fileDocument(user, id, { action, ...input }) });
});
