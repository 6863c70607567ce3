import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { rejectBatch } from "@/lib/data/disposal-decide";
import { batchIdSchema, rejectBatchSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("disposal.approve", "reject disposal batches");
  const id = batchIdSchema.parse((await params).id);
  const { reason } = rejectBatchSchema.parse(await readJson(request));
  return NextResponse.json({ batch: await rejectBatch(user, id, reason) });
});
