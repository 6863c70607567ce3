import "server-only";
// The health check load balancers ask: each service is raced against a short limit, so the
// answer comes within HEALTH_LIMIT_MS whatever hangs (a frozen database keeps its TCP
// connections open and never answers; the pool's own query timeout is far longer).
import pTimeout from "p-timeout";
import { getDb } from "@/db";
import { checkStorage } from "@/storage/s3";

// The route must answer within 2 s (issue 13); the two checks run side by side, and the rest
// of the 2 s is for the HTTP round trip and a busy event loop.
export const HEALTH_LIMIT_MS = 1500;

type State = "ok" | "down";

async function race(what: string, check: () => Promise<boolean>): Promise<State> {
  try {
    return (await pTimeout(check(), { milliseconds: HEALTH_LIMIT_MS })) ? "ok" : "down";
  } catch (e) {
    console.error(`health: ${what} is down:`, e instanceof Error ? e.message : e);
    return "down";
  }
}

export async function checkHealth(): Promise<{ database: State; storage: State }> {
  const [database, storage] = await Promise.all([
    race("the database", () => getDb().raw("SELECT 1").then(() => true)),
    race("the document store", () => checkStorage()),
  ]);
  return { database, storage };
}
