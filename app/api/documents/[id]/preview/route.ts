import { z } from "zod";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { getPreviewPage } from "@/lib/data/preview";
import { documentIdSchema } from "@/lib/validations/documents";

export const dynamic = "force-dynamic";

const querySchema = z.object({ page: z.coerce.number({ message: "page must be a number like 1." }).int().min(1, "Pages start at 1.").max(10_000).default(1) });

/** One page of the original as a PNG, after the same access check as the original (walled: 404). */
export const GET = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("documents.read", "see documents");
  const id = documentIdSchema.parse((await params).id);
  const { page } = querySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const p = await getPreviewPage(user, id, page);
  return new Response(new Uint8Array(p.png), {
    headers: {
      "content-type": "image/png",
      "content-length": String(p.png.byteLength),
      "x-page-count": String(p.pageCount),
      "x-preview-cache": p.cached ? "hit" : "miss",
      "cache-control": "private, max-age=300",
      "x-content-type-options": "nosniff",
    },
  });
});
