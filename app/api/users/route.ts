import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { requireUser } from "@/lib/data/current-user";
import { invitePerson, listPeople } from "@/lib/data/people";
import { inviteSchema } from "@/lib/validations/people";

export const dynamic = "force-dynamic";

export const GET = handle(async () => {
  await requireUser("setup.manage", "see the people of the office");
  const items = await listPeople();
  return NextResponse.json({ items, total: items.length });
});

/** Invites a person: the account waits without a password until they accept the e-mailed link. */
export const POST = handle(async (request: Request) => {
  const admin = await requireUser("setup.manage", "invite people");
  const input = inviteSchema.parse(await readJson(request));
  return NextResponse.json({ person: await invitePerson(admin, input) }, { status: 201 });
});
