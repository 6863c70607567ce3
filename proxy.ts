// Runs before every page and API request: keeps the idle timer of a live session moving and
// sends signed-out visitors of app pages to sign-in. The real checks stay on the server in
// lib/data (a proxy is a convenience, not the authority).
import { getIronSession } from "iron-session";
import { NextResponse, type NextRequest } from "next/server";
import { isSessionLive, sessionOptions, type SessionData } from "@/lib/auth/session";

// Invitation and reset links are opened signed out; the one-time token is their credential.
const PUBLIC = ["/sign-in", "/forgot-password", "/invite/", "/reset-password/", "/api/", "/_next/", "/favicon"];

export async function proxy(request: NextRequest) {
  const response = NextResponse.next();
  const session = await getIronSession<SessionData>(request, response, sessionOptions());
  const live = isSessionLive(session);
  const path = request.nextUrl.pathname;
  if (!live && !PUBLIC.some((p) => path.startsWith(p))) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = path === "/" ? "" : `?next=${encodeURIComponent(path)}`;
    return NextResponse.redirect(url);
  }
  // Re-seal at most once a minute; the cookie then carries the new idle deadline.
  if (live && Date.now() - session.lastSeen > 60_000) {
    session.lastSeen = Date.now();
    await session.save();
  }
  return response;
}

export const config = { matcher: ["/((?!_next/static|_next/image|favicon.ico).*)"] };
