// Telling "the database is not answering" (503, try again) from every other database error
// (a bug or bad data: 500, logged with its cause). The codes are mysql2's and Node's network
// errors, and Knex's own pool time-out; MariaDB server error numbers from its error reference
// (1040 too many connections, 1053 shutdown in progress, 2002/2003/2006/2013 client-side
// connection losses, 1969 max_statement_time reached, 1205 a row lock not granted in time: the
// server is too slow or too busy to answer now, which is "try again", not a bug).
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "EHOSTUNREACH",
  "ENOTFOUND",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
  "ER_SERVER_GONE_ERROR",
  "CR_SERVER_GONE_ERROR",
  "CR_SERVER_LOST",
  "CR_CONNECTION_ERROR",
  "CR_CONN_HOST_ERROR",
  "ER_STATEMENT_TIMEOUT",
  "ER_LOCK_WAIT_TIMEOUT",
]);

export function isDatabaseUnavailable(e: unknown): boolean {
  if (typeof e !== "object" || e === null) return false;
  const err = e as { code?: string; name?: string; message?: string; fatal?: boolean };
  if (err.code && UNAVAILABLE_CODES.has(err.code)) return true;
  if (err.name === "KnexTimeoutError") return true; // no pooled connection in time
  if (err.fatal === true) return true; // mysql2 marks a connection-ending error fatal
  return false;
}
