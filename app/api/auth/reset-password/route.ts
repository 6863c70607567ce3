import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/http";
import { limitLinkAttempt } from "@/lib/data/rate-limit";
import { clientAddressOf } from "@/lib/net/client-address";
import { resetPassword } from "@/lib/data/passwords";
import { tokenPasswordSchema } from "@/lib/validations/people";

// Public on purpose: the one-time link is the credential. Limited per client
// address and per link (lib/data/rate-limit.ts).
export const POST = handle(async (request: Request) => {
  const { token, password } = tokenPasswordSchema.parse(await readJson(request));
  await limitLinkAttempt(token, clientAddressOf(request.headers));
  const { email } = await resetPassword(token, password);
  return NextResponse.json({ email, message: "Your new password is set and you are signed out everywhere else. Sign in with it now." });
});
