import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { proposeBatch } from "@/lib/data/disposal";
import { getBatch, listBatches } from "@/lib/data/disposal-batches";
import { RETENTION_CAUTION } from "@/lib/retention";
import { dueListSchema, proposeBatchSchema } from "@/lib/validations/records";

export const dynamic = "force-dynamic";

export const GET = handle(async (request: Request) => {
  const user = await requireUser("disposal.read", "see disposal batches");
  const p = dueListSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const { items, total } = await listBatches(user, p);
  return NextResponse.json({ items, total, page: p.page, pageSize: p.pageSize });
});

/** An admin proposes a batch; nothing is destroyed until a second person approves it. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser("disposal.propose", "propose disposal batches");
  const input = proposeBatchSchema.parse(await readJson(request));
  const id = await proposeBatch(user, input);
  return NextResponse.json({ batch: await getBatch(user, id), caution: RETENTION_CAUTION }, { status: 201 });
});
