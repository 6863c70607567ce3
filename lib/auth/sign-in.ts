import "server-only";
// Sign-in and sign-out shared by the route handlers and the server actions.
import { getSession } from "@/lib/auth/session";
import { checkCredentials, type SignInResult } from "@/lib/data/users";

export async function signIn(email: string, password: string): Promise<SignInResult> {
  const result = await checkCredentials(email, password);
  if (result.ok) {
    const session = await getSession();
    const now = Date.now();
    session.userId = result.user.id;
    session.issuedAt = now;
    session.lastSeen = now;
    await session.save();
  }
  return result;
}

export async function signOut(): Promise<void> {
  const session = await getSession();
  session.destroy();
}
