import { NextResponse } from "next/server";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listDocuments } from "@/lib/data/documents";
import { storeUpload, type UploadResult } from "@/lib/data/intake";
import { documentListSchema } from "@/lib/validations/documents";

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
  if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    throw new AppError(415, "not_multipart", "Send the files as multipart/form-data, one or more fields named \"file\".");
  }
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > env.uploadMaxBytes * env.uploadMaxFiles + 1024 * 1024) {
    throw new AppError(413, "too_large", `This upload is larger than Foldwright accepts at once. Send at most ${env.uploadMaxFiles} files of up to ${Math.round(env.uploadMaxBytes / 1048576)} MB each.`);
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError(400, "bad_form", "The upload could not be read. Send the files again as multipart/form-data fields named \"file\".");
  }
  const files = form.getAll("file").filter((f): f is File => typeof f === "object" && f !== null && "arrayBuffer" in f);
  if (files.length === 0) throw new AppError(422, "no_files", "No files came with this upload. Add one or more fields named \"file\".");
  if (files.length > env.uploadMaxFiles) {
    throw new AppError(413, "too_many_files", `At most ${env.uploadMaxFiles} files go in one upload. Split the rest into another upload.`);
  }
  const results: UploadResult[] = [];
  for (const file of files) results.push(await storeUpload(user, file.name, new Uint8Array(await file.arrayBuffer())));
  const statuses = new Set(results.map((r) => r.httpStatus));
  const status = statuses.size === 1 ? results[0].httpStatus : 200;
  return NextResponse.json({ files: results.map(({ httpStatus, ...r }) => ({ ...r, httpStatus })) }, { status });
});
