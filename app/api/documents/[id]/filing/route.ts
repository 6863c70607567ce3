import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { fileDocument } from "@/lib/data/filing";
import { documentIdSchema } from "@/lib/validations/documents";
import { filingSchema } from "@/lib/validations/filing";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("filing.decide", "file documents");
  const id = documentIdSchema.parse((await params).id);
  const input = filingSchema.parse(await readJson(request));
  return NextResponse.json({ filing: await fileDocument(user, id, input) });
});
