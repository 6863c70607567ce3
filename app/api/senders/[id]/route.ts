import { NextResponse } from "next/server";
import { z } from "zod";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { removeSender } from "@/lib/data/senders";

export const DELETE = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const admin = await requireUser("setup.manage", "remove allowed senders");
  const id = z.coerce.number().int().positive().parse((await params).id);
  await removeSender(admin, id);
  return NextResponse.json({ removed: id });
});
