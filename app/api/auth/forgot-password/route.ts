import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { limitResetRequest } from "@/lib/data/rate-limit";
import { clientAddressOf } from "@/lib/net/client-address";
import { FORGOT_ANSWER, requestPasswordReset } from "@/lib/data/passwords";
import { forgotSchema } from "@/lib/validations/people";

// Public on purpose, and the same answer whether or not the address has an account.
// Limited per address asked for and per client address, alike for known and unknown addresses.
export const POST = handle(async (request: Request) => {
  const { email } = forgotSchema.parse(await readJson(request));
  await limitResetRequest(email, clientAddressOf(request.headers));
  await requestPasswordReset(email);
  return NextResponse.json({ message: FORGOT_ANSWER }, { status: 202 });
});
