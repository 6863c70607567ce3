// Knex's mysql2 client with a time limit on every statement. Knex has no pool-wide query
// timeout, and a frozen server (SIGSTOP, a hung host) keeps the TCP connection open while never
// answering, so without one every request waits forever. mysql2's per-query `timeout` gives up
// on the client side ("Query inactivity timeout", code PROTOCOL_SEQUENCE_TIMEOUT); the
// connection is then destroyed so the pool never hands out one with a statement still pending.
// MariaDB's max_statement_time (set per session in knexfile.ts) stops the same statement on a
// server that is alive but slow. Errors that mean "the database is not answering" (a connection
// refused, lost or timed out, no pooled connection in time) are marked for the 503 answer.
import type { Knex } from "knex";
import ClientMySQL2 from "knex/lib/dialects/mysql2/index.js";
import { isDatabaseUnavailable } from "@/db/errors";
import { markUnavailable } from "@/lib/unavailable";

interface RawConnection {
  destroy(): void;
}
interface QueryObject {
  sql?: string;
  options?: Record<string, unknown>;
}
type QueryFn = (connection: RawConnection, obj: QueryObject | string) => Promise<unknown>;
type AcquireFn = () => Promise<unknown>;

function mark(e: unknown): never {
  throw isDatabaseUnavailable(e) ? markUnavailable(e, "database") : e;
}

export function timedMySql2Client(timeoutMs: number): new (config: Knex.Config) => Knex.Client {
  class TimedMySql2 extends ClientMySQL2 {
    _query(connection: RawConnection, input: QueryObject | string): Promise<unknown> {
      const obj: QueryObject = !input || typeof input === "string" ? { sql: input as string } : input;
      if (timeoutMs > 0) obj.options = { timeout: timeoutMs, ...obj.options };
      const query = (ClientMySQL2.prototype as unknown as { _query: QueryFn })._query;
      return query.call(this, connection, obj).catch((e: unknown) => {
        if ((e as { code?: string })?.code === "PROTOCOL_SEQUENCE_TIMEOUT") connection.destroy();
        return mark(e);
      });
    }

    acquireConnection(): Promise<unknown> {
      const acquire = (ClientMySQL2.prototype as unknown as { acquireConnection: AcquireFn }).acquireConnection;
      return acquire.call(this).catch(mark);
    }
  }
  return TimedMySql2;
}
