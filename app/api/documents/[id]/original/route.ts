import { Readable } from "node:stream";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { findOriginal } from "@/lib/data/documents";
import { documentIdSchema } from "@/lib/validations/documents";
import { AppError } from "@/lib/errors";
import { getObjectStream, isMissingObject, isStorageUnavailable } from "@/storage/s3";

export const dynamic = "force-dynamic";

/** RFC 6266 / RFC 5987: an ASCII fallback name plus the exact UTF-8 name. */
function contentDisposition(name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("documents.read", "download documents");
  const id = documentIdSchema.parse((await params).id);
  const original = await findOriginal(user, id);
  let stream: Readable;
  try {
    stream = await getObjectStream(original.key);
  } catch (e) {
    console.error(`original of document ${id}: the store answered`, e);
    if (isMissingObject(e)) {
      throw new AppError(404, "original_missing", "The original of this document is not in the document store. Tell your admin: it may need restoring from a backup.");
    }
    if (isStorageUnavailable(e)) {
      throw new AppError(503, "storage_unavailable", "The document store is not answering, so the original cannot be sent now. Try again in a minute.");
    }
    throw new AppError(500, "storage_refused", "The document store refused to send this original. Tell your admin (the server log has the store's answer).");
  }
  return new Response(Readable.toWeb(stream) as ReadableStream, {
    headers: {
      "content-type": original.mediaType,
      "content-length": String(original.size),
      "content-disposition": contentDisposition(original.name),
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
