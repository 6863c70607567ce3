import "server-only";
// MariaDB named locks (GET_LOCK): held by one connection, so the work runs while that connection
// is reserved. Any number of app servers share them through the database.
import { getDb } from "@/db";

/** Runs `work` holding the named lock; returns null at once when another holder has it. */
export async function withNamedLock<T>(name: string, waitSeconds: number, work: () => Promise<T>): Promise<T | null> {
  const db = getDb();
  const conn = await db.client.acquireConnection();
  try {
    const [rows] = await conn.promise().query("SELECT GET_LOCK(?, ?) AS got", [name, waitSeconds]);
    if (Number((rows as { got: number | null }[])[0].got) !== 1) return null;
    try {
      return await work();
    } finally {
      await conn.promise().query("SELECT RELEASE_LOCK(?)", [name]).catch(() => {});
    }
  } finally {
    await db.client.releaseConnection(conn);
  }
}
