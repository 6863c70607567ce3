// Sealed, HttpOnly, SameSite=Lax session cookies (iron-session). The cookie holds only the user id
// and times; the role and the account's state are read from the database on every request.
import { getIronSession, type SessionOptions } from "iron-session";
import { cookies } from "next/headers";
import { env, sessionSecret } from "@/lib/env";

export interface SessionData {
  userId?: number;
  epoch?: number;
  issuedAt?: number;
  lastSeen?: number;
}

export const SESSION_COOKIE = "foldwright_session";

export function sessionOptions(): SessionOptions {
  return {
    cookieName: SESSION_COOKIE,
    password: sessionSecret(),
    ttl: env.session.maxHours * 3600,
    cookieOptions: { httpOnly: true, sameSite: "lax", secure: env.session.secureCookie, path: "/" },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}

/** Signed in, not idle past SESSION_IDLE_MINUTES, not past SESSION_MAX_HOURS. */
export function isSessionLive(data: SessionData, now = Date.now()): data is Required<SessionData> {
  if (!data.userId || !data.lastSeen || !data.issuedAt || data.epoch === undefined) return false;
  if (now - data.lastSeen > env.session.idleMinutes * 60_000) return false;
  return now - data.issuedAt <= env.session.maxHours * 3_600_000;
}
