import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { resetPassword } from "@/lib/data/passwords";
import { tokenPasswordSchema } from "@/lib/validations/people";

// Public on purpose: the one-time link is the credential. Not rate-limited yet (see README).
export const POST = handle(async (request: Request) => {
  const { token, password } = tokenPasswordSchema.parse(await readJson(request));
  const { email } = await resetPassword(token, password);
  return NextResponse.json({ email, message: "Your new password is set and you are signed out everywhere else. Sign in with it now." });
});
