import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { FORGOT_ANSWER, requestPasswordReset } from "@/lib/data/passwords";
import { forgotSchema } from "@/lib/validations/people";

// Public on purpose, and the same answer whether or not the address has an account.
// Not rate-limited yet (see README).
export const POST = handle(async (request: Request) => {
  const { email } = forgotSchema.parse(await readJson(request));
  await requestPasswordReset(email);
  return NextResponse.json({ message: FORGOT_ANSWER }, { status: 202 });
});
