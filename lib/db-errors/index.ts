/** Whether an error means "the database cannot be reached" (→ 503), as opposed to a bug (→ 500). */
export function isDatabaseDown(err: unknown): boolean {
  const codes = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "PROTOCOL_CONNECTION_LOST", "ER_CON_COUNT_ERROR", "EPIPE", "ENOTFOUND", "PROTOCOL_SEQUENCE_TIMEOUT", "ER_SERVER_SHUTDOWN"]);
  // Queries in flight when the server stops: 1053 server shutdown in progress, 1927 connection
  // killed (MariaDB), 2006 server gone away, 2013 connection lost during a query.
  const errnos = new Set([1053, 1927, 2006, 2013]);
  for (let e: unknown = err, depth = 0; e && depth < 6; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === "string" && codes.has(code)) return true;
    const errno = (e as { errno?: unknown }).errno;
    if (typeof errno === "number" && errnos.has(errno)) return true;
    const msg = (e as { message?: unknown }).message;
    if (typeof msg === "string" && /ECONNREFUSED|connect ETIMEDOUT|Connection lost|Pool is closed|connection is in closed state|Server shutdown in progress|Connection was killed/.test(msg)) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}
