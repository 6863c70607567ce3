// Shared pieces of the route handlers: the JSON error shape and the status mapping.
import { NextResponse } from "next/server";
import { ZodError } from "zod";
import { AppError, RateLimited } from "@/lib/errors";
import { csrfRefusal } from "@/lib/csrf";
import { isDatabaseUnavailable } from "@/db/errors";
import { UNAVAILABLE_CODE, UNAVAILABLE_SENTENCE, unavailableService } from "@/lib/unavailable";

// The 503 sentences say "try again in a minute"; clients that read Retry-After wait half that.
export const RETRY_AFTER_SECONDS = 30;

export function errorResponse(status: number, code: string, message: string, headers?: HeadersInit) {
  return NextResponse.json({ error: { code, message } }, { status, headers });
}

export function toErrorResponse(e: unknown) {
  if (e instanceof RateLimited) return errorResponse(e.status, e.code, e.message, { "Retry-After": String(e.retryAfterSeconds) });
  if (e instanceof AppError) return errorResponse(e.status, e.code, e.message);
  if (e instanceof ZodError) {
    const first = e.issues[0];
    const where = first?.path.length ? `${first.path.join(".")}: ` : "";
    return errorResponse(422, "bad_input", `${where}${first?.message ?? "The request is not valid."}`);
  }
  const service = unavailableService(e) ?? (isDatabaseUnavailable(e) ? "database" : null);
  if (service) {
    console.error(`${service} not answering (503):`, e);
    return errorResponse(503, UNAVAILABLE_CODE[service], UNAVAILABLE_SENTENCE[service], { "Retry-After": String(RETRY_AFTER_SECONDS) });
  }
  console.error(e);
  return errorResponse(500, "internal", "Something went wrong on our side. Nothing was changed; try again in a moment.");
}

/**
 * Wraps a route handler so that every thrown error gets the JSON error shape. Every write
 * (POST/PUT/PATCH/DELETE) first passes the CSRF check of lib/csrf.ts, or is a 403.
 */
export function handle<A extends unknown[]>(fn: (...args: A) => Promise<Response>) {
  return async (...args: A): Promise<Response> => {
    const request = args[0] as Request | undefined;
    const refused = typeof request?.headers?.get === "function" ? csrfRefusal(request) : null;
    if (refused) return errorResponse(403, refused.code, refused.message);
    try {
      return await fn(...args);
    } catch (e) {
      return toErrorResponse(e);
    }
  };
}

/** Parses a JSON body; a body that is not JSON is a 400 with a sentence. */
export async function readJson(request: Request): Promise<unknown> {
  try {
    return await request.json();
  } catch {
    throw new AppError(400, "bad_json", "The request body is not valid JSON. Send a JSON object.");
  }
}
