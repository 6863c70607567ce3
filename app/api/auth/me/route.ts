import { NextResponse } from "next/server";
import { requireUser } from "@/lib/data/current-user";
import { areasFor } from "@/lib/auth/permissions";
import { handle } from "@/lib/http";

export const GET = handle(async () => {
  const user = await requireUser();
  return NextResponse.json({ user, areas: areasFor(user.role).map((a) => a.href) });
});
