import "server-only";
// Who is asking. Every route handler, server action and page starts here.
import { cache } from "react";
import { redirect } from "next/navigation";
import { getSession, isSessionLive } from "@/lib/auth/session";
import { can, type Permission } from "@/lib/auth/permissions";
import { notAllowed, signedOut } from "@/lib/errors";
import { findSessionUser, type CurrentUser } from "@/lib/data/users";

export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await getSession();
  if (!isSessionLive(session)) return null;
  return findSessionUser(session.userId, session.epoch);
});

/** For route handlers and server actions: throws 401 / 403 errors. */
export async function requireUser(permission?: Permission, what?: string): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw signedOut();
  if (permission && !can(user.role, permission)) throw notAllowed(what);
  return user;
}

/** For pages: signed-out visitors go to sign-in; a wrong role gets `allowed: false`. */
export async function requirePageUser(permission?: Permission): Promise<{ user: CurrentUser; allowed: boolean }> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  return { user, allowed: !permission || can(user.role, permission) };
}
