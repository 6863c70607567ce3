import { NextResponse } from "next/server";
import { z } from "zod";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { listOutbox } from "@/lib/data/mail-log";

export const dynamic = "force-dynamic";

const pageSchema = z.object({ page: z.coerce.number().int().min(1).default(1), pageSize: z.coerce.number().int().min(1).max(200).default(50) });

/** The mail log: every message with its state (admins). No content: that stays in the catcher's files. */
export const GET = handle(async (request: Request) => {
  await requireUser("setup.manage", "read the outbox");
  const { page, pageSize } = pageSchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return NextResponse.json({ ...(await listOutbox(page, pageSize)), page, pageSize });
});
