import { NextResponse } from "next/server";
import { signOut } from "@/lib/auth/sign-in";
import { handle } from "@/lib/http";

export const POST = handle(async () => {
  await signOut();
  return NextResponse.json({ signedOut: true });
});
