import { describe, expect, it } from "vitest";
import { toErrorResponse } from "@/lib/http";
import { markUnavailable, unavailableService } from "@/lib/unavailable";

// Any database or storage failure answers 503 with a sentence in the JSON error shape; a bug
// stays a 500 with its own sentence (issue 13). Error shapes: mysql2's codes, Knex's pool
// time-out class name, and the AWS SDK's $metadata on a request that got no HTTP answer.
async function answer(e: unknown) {
  const res = toErrorResponse(e);
  return { status: res.status, body: await res.json(), retryAfter: res.headers.get("retry-after") };
}

describe("toErrorResponse for services that do not answer", () => {
  it("a lost connection, a refused one and a pool time-out are 503 database_unavailable", async () => {
    const lost = Object.assign(new Error("Connection lost"), { code: "PROTOCOL_CONNECTION_LOST", fatal: true });
    const refused = Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });
    const pool = Object.assign(new Error("Knex: Timeout acquiring a connection."), { name: "KnexTimeoutError" });
    const statement = Object.assign(new Error("Query execution was interrupted (max_statement_time exceeded)"), { code: "ER_STATEMENT_TIMEOUT" });
    for (const e of [lost, refused, pool, statement]) {
      const a = await answer(e);
      expect(a.status).toBe(503);
      expect(a.body.error.code).toBe("database_unavailable");
      expect(a.body.error.message).toMatch(/^The database is not answering\b.*\btry again\b/);
      expect(Number(a.retryAfter)).toBeGreaterThan(0);
    }
  });

  it("a store marked unavailable is 503 storage_unavailable, and the mark survives as the digest pages see", async () => {
    const network = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:4568"), { $metadata: { attempts: 2 } });
    markUnavailable(network, "storage");
    expect(unavailableService(network)).toBe("storage");
    const a = await answer(network);
    expect(a.status).toBe(503);
    expect(a.body.error.code).toBe("storage_unavailable");
    expect(a.body.error.message).toMatch(/^The document store is not answering/);
  });

  it("a bug is still a 500 with a sentence, not a 503", async () => {
    const bug = Object.assign(new Error("Table 'x' doesn't exist"), { code: "ER_NO_SUCH_TABLE" });
    const a = await answer(bug);
    expect(a.status).toBe(500);
    expect(a.body.error.message).toMatch(/Nothing was changed/);
  });
});
