// Password hashing with bcrypt (the bcryptjs package: pure JavaScript, no native build).
import bcrypt from "bcryptjs";
import { env } from "@/lib/env";

export function hashPassword(password: string, cost = env.signIn.bcryptCost): Promise<string> {
  return bcrypt.hash(password, cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// A real hash of a random string, compared against when the e-mail is unknown, so that an
// unknown address takes as long as a wrong password and does not reveal who has an account.
const DECOY_HASH = "$2b$11$x92bX.CCdQP5Li5wy7QfOupj0Cr0V9ptdIqqWklADC2ttCzuHF1yS";
export async function burnPasswordCheck(password: string): Promise<void> {
  await bcrypt.compare(password, DECOY_HASH);
}
