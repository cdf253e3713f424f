/** Whether an error means "the database cannot be reached" (→ 503), as opposed to a bug (→ 500). */
export function isDatabaseDown(err: unknown): boolean {
  const codes = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "PROTOCOL_CONNECTION_LOST", "ER_CON_COUNT_ERROR", "EPIPE", "ENOTFOUND", "PROTOCOL_SEQUENCE_TIMEOUT"]);
  for (let e: unknown = err, depth = 0; e && depth < 6; depth++) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === "string" && codes.has(code)) return true;
    const msg = (e as { message?: unknown }).message;
    if (typeof msg === "string" && /ECONNREFUSED|connect ETIMEDOUT|Connection lost|Pool is closed/.test(msg)) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}
