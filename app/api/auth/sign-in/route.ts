import { NextResponse } from "next/server";
import { signIn } from "@/lib/auth/sign-in";
import { errorResponse, handle, readJson } from "@/lib/http";
import { signInSchema } from "@/lib/validations/auth";
import { clientAddressOf } from "@/lib/net/client-address";

export const POST = handle(async (request: Request) => {
  const { email, password } = signInSchema.parse(await readJson(request));
  const result = await signIn(email, password, clientAddressOf(request.headers));
  if (!result.ok) return errorResponse(result.code === "account_locked" ? 423 : 401, result.code, result.message);
  return NextResponse.json({ user: result.user });
});
