import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { addSender, listSenders } from "@/lib/data/senders";
import { senderSchema } from "@/lib/validations/people";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  await requireUser("setup.manage", "see the allowed senders");
  const items = await listSenders();
  return NextResponse.json({ items, total: items.length });
});

export const POST = handle(async (request: Request) => {
  const admin = await requireUser("setup.manage", "allow senders");
  const input = senderSchema.parse(await readJson(request));
  return NextResponse.json({ sender: await addSender(admin, input) }, { status: 201 });
});
