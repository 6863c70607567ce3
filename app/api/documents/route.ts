import { NextResponse } from "next/server";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { enforceRateLimit, RATE_RULES } from "@/lib/data/rate-limit";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listDocuments } from "@/lib/data/documents";
import { storeUpload, type UploadResult } from "@/lib/data/intake";
import { documentListSchema } from "@/lib/validations/documents";
import { spoolUpload } from "@/lib/intake/spool-upload";
import { formatSize } from "@/lib/intake/format-size";

const MULTIPART_SLACK = 1024 * 1024;

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("documents.read", "see documents");
  const params = documentListSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listDocuments(user, {
    status: params.status,
    q: params.q,
    uploadedByMe: Boolean(params.mine),
    ids: params.ids?.split(",").map(Number),
    cabinetTypeId: params.cabinetType,
    matterId: params.matter,
    retention: params.retention,
    filed: params.filed === undefined ? undefined : params.filed === "1" || params.filed === "true",
    page: params.page,
    pageSize: params.pageSize,
  });
  return NextResponse.json({ items, total, page: params.page, pageSize: params.pageSize });
});

/** One answer per file; the response status is the file's when all files share one. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("documents.upload", "upload documents");
  await enforceRateLimit(RATE_RULES.uploads(), String(user.id));
  if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    throw new AppError(415, "not_multipart", "Send the files as multipart/form-data, one or more fields named \"file\".");
  }
  // UPLOAD_MAX_BYTES of files per request, plus room for the multipart framing of each part.
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > env.uploadMaxBytes + MULTIPART_SLACK) {
    throw new AppError(413, "too_large", `This upload is larger than the ${formatSize(env.uploadMaxBytes)} Foldwright takes at once, so nothing was kept. Upload the files in smaller groups, each file under ${formatSize(env.uploadMaxBytes)}.`);
  }
  // Streamed to disk as it arrives (this path is outside proxy.ts, whose body copy stops at 10 MB).
  const { files, dispose } = await spoolUpload(request, { maxBytes: env.uploadMaxBytes, maxFiles: env.uploadMaxFiles });
  const results: UploadResult[] = [];
  try {
    if (files.length === 0) throw new AppError(422, "no_files", "No files came with this upload. Add one or more fields named \"file\".");
    for (const file of files) results.push(await storeUpload(user, file.name, file));
  } finally {
    await dispose();
  }
  const statuses = new Set(results.map((r) => r.httpStatus));
  const status = statuses.size === 1 ? results[0].httpStatus : 200;
  return NextResponse.json({ files: results.map(({ httpStatus, ...r }) => ({ ...r, httpStatus })) }, { status });
});
