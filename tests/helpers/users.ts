import type { CurrentUser } from "@/lib/data/users";
import { ownerDb } from "./db";

/** The seeded demo user with this e-mail, as the Data Access Layer sees a signed-in user. */
export async function demoUser(email: string): Promise<CurrentUser> {
  const db = ownerDb();
  try {
    const row = await db("users").where({ email }).first("id", "email", "name", "role");
    if (!row) throw new Error(`no demo user ${email}: were the seeds run?`);
    return row;
  } finally {
    await db.destroy();
  }
}
