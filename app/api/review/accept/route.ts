import { NextResponse } from "next/server";
import { AppError } from "@/lib/errors";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { fileDocument } from "@/lib/data/filing";
import { acceptManySchema } from "@/lib/validations/filing";

/** Accepts many suggestions at once (into one matter when `matterId` is given); one answer per document, nothing stops at the first error. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("filing.decide", "file documents");
  const { documentIds, matterId } = acceptManySchema.parse(await readJson(request));
  const results = [];
  for (const id of documentIds) {
    try {
      results.push({ documentId: id, ok: true, filing: await fileDocument(user, id, { action: "accept", matterId }) });
    } catch (e) {
      if (!(e instanceof AppError)) throw e;
      results.push({ documentId: id, ok: false, error: { code: e.code, message: e.message } });
    }
  }
  return NextResponse.json({ results, accepted: results.filter((r) => r.ok).length });
});
