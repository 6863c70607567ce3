// Runs before every page and API request: keeps the idle timer of a live session moving, sends
// signed-out visitors of app pages to sign-in, and gives each page its Content Security Policy
// with a fresh nonce (lib/security-headers.ts; the fixed headers are in next.config.mjs). The real
// checks stay on the server in lib/data (a proxy is a convenience, not the authority).
import { getIronSession } from "iron-session";
import { NextResponse, type NextRequest } from "next/server";
import { isSessionLive, sessionOptions, type SessionData } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { HSTS, newNonce, pagePolicy } from "@/lib/security-headers";

// Invitation and reset links are opened signed out; the one-time token is their credential.
const PUBLIC = ["/sign-in", "/forgot-password", "/invite/", "/reset-password/", "/api/", "/_next/", "/favicon"];

export async function proxy(request: NextRequest) {
  const path = request.nextUrl.pathname;
  const https = env.https || request.headers.get("x-forwarded-proto") === "https";
  const page = !path.startsWith("/api/") && !path.startsWith("/_next/");
  let policy: string | null = null;
  let response: NextResponse;
  if (page) {
    policy = pagePolicy(newNonce(), { dev: !env.production, https });
    const headers = new Headers(request.headers);
    headers.set("content-security-policy", policy);
    response = NextResponse.next({ request: { headers } });
  } else {
    response = NextResponse.next();
  }
  const session = await getIronSession<SessionData>(request, response, sessionOptions());
  const live = isSessionLive(session);
  if (!live && !PUBLIC.some((p) => path.startsWith(p))) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = path === "/" ? "" : `?next=${encodeURIComponent(path)}`;
    response = NextResponse.redirect(url);
  }
  // Re-seal at most once a minute; the cookie then carries the new idle deadline.
  else if (live && Date.now() - session.lastSeen > 60_000) {
    session.lastSeen = Date.now();
    await session.save();
  }
  if (policy) response.headers.set("content-security-policy", policy);
  // Behind a TLS proxy (X-Forwarded-Proto) next.config.mjs adds it; an https APP_ORIGIN adds it here.
  if (env.https) response.headers.set("strict-transport-security", HSTS);
  return response;
}

// Uploads and archive imports stream from the request (to disk and storage): the proxy would first
// copy the body into memory and cut it at 10 MB (proxyClientMaxBodySize, Next.js docs), so
// /api/documents and /api/imports go straight to their routes, which check the session themselves.
export const config = { matcher: ["/((?!_next/static|_next/image|favicon.ico|api/imports|api/documents$).*)"] };
