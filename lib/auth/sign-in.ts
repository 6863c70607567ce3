import "server-only";
// Sign-in and sign-out shared by the route handlers and the server actions.
import { getSession, isSessionLive } from "@/lib/auth/session";
import { checkCredentials, endUserSessions, type SignInResult } from "@/lib/data/users";

export async function signIn(email: string, password: string, address: string): Promise<SignInResult> {
  const result = await checkCredentials(email, password, address);
  if (result.ok) {
    const session = await getSession();
    const now = Date.now();
    session.userId = result.user.id;
    session.epoch = result.epoch;
    session.issuedAt = now;
    session.lastSeen = now;
    await session.save();
  }
  return result;
}

export async function signOut(): Promise<void> {
  const session = await getSession();
  if (isSessionLive(session)) await endUserSessions(session.userId);
  session.destroy();
}
