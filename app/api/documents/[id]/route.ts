import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getDocument } from "@/lib/data/documents";
import { getLatestSuggestion, listDocumentTimeline } from "@/lib/data/filing-record";
import { listHoldsOnDocument } from "@/lib/data/holds";
import { documentIdSchema } from "@/lib/validations/documents";

export const dynamic = "force-dynamic";

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("documents.read", "see documents");
  const id = documentIdSchema.parse((await params).id);
  const document = await getDocument(user, id); // checks access first
  const [suggestion, timeline, holds] = await Promise.all([getLatestSuggestion(user, id), listDocumentTimeline(user, id), listHoldsOnDocument(id)]);
  return NextResponse.json({ document, suggestion, timeline, holds });
});
