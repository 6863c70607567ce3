import { NextResponse } from "next/server";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { receiveImport } from "@/lib/data/import-receive";
import { formatSize } from "@/lib/intake/format-size";

export const dynamic = "force-dynamic";

/** An archive to import: the zip as field "file", or a folder's files as "folderFile" fields, each after its "path". */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("setup.manage", "import an archive");
  if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    throw new AppError(415, "not_multipart", "Send the archive as multipart/form-data: the zip as the field \"file\", or a folder's files as fields \"folderFile\".");
  }
  const declared = Number(request.headers.get("content-length") ?? 0);
  if (declared > env.imports.maxBytes + 16 * 1024 * 1024) {
    throw new AppError(413, "too_large", `This archive is larger than the ${formatSize(env.imports.maxBytes)} Foldwright takes in one import. Import its folders in several parts.`);
  }
  const id = await receiveImport(user, request);
  return NextResponse.json({ id }, { status: 202 });
});
