import { NextResponse } from "next/server";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { approveBatch } from "@/lib/data/disposal-decide";
import { RETENTION_CAUTION } from "@/lib/retention";
import { batchIdSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

/** The second person's approval: destroys the batch's originals, keeps tombstones. */
export const POST = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser("disposal.approve", "approve disposal batches");
  const id = batchIdSchema.parse((await params).id);
  return NextResponse.json({ ...(await approveBatch(user, id)), caution: RETENTION_CAUTION });
});
