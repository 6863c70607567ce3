// Errors a person can act on. Route handlers turn them into
// {"error": {"code", "message"}} with the status; anything else becomes a bare 500.
export class AppError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const signedOut = () =>
  new AppError(401, "signed_out", "You are signed out. Sign in and try again.");

export const notAllowed = (what = "do this") =>
  new AppError(403, "not_allowed", `Your role does not allow you to ${what}. Ask an admin if you need it.`);

export const notFound = (what = "That item") =>
  new AppError(404, "not_found", `${what} was not found. It may have been removed, or you may not have access to it.`);

export const badInput = (message: string) => new AppError(422, "bad_input", message);

/** 429: a rate limit was reached (lib/data/rate-limit.ts); answered with Retry-After. */
export class RateLimited extends AppError {
  constructor(
    public readonly retryAfterSeconds: number,
    message: string,
  ) {
    super(429, "rate_limited", message);
  }
}
