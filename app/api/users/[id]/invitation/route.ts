import { NextResponse } from "next/server";
import { z } from "zod";
import { handle } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { resendInvitation } from "@/lib/data/people";

/** Sends a new invitation link; the earlier one stops working. */
export const POST = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const admin = await requireUser("setup.manage", "invite people");
  const id = z.coerce.number().int().positive().parse((await params).id);
  return NextResponse.json({ person: await resendInvitation(admin, id) });
});
