// The other half of lib/outage.mjs, for scripts/serve.mjs: each request runs inside an
// AsyncLocalStorage slot on globalThis, and an answer that starts with a 5xx on a request whose slot
// names an outage goes out as the 503 outage answer instead.
import { AsyncLocalStorage } from "node:async_hooks";
import { OUTAGE_RETRY_AFTER_S, OUTAGE_SLOT, outageMessage, outagePage } from "../../lib/outage.mjs";

/** Creates the storage behind noteOutage() (lib/outage.mjs); run each request with `.run({}, …)`. */
export function installOutageSlot() {
  const outages = new AsyncLocalStorage();
  globalThis[OUTAGE_SLOT] = outages;
  return outages;
}

/**
 * A request's outage slot (lib/outage.mjs): the app's code notes here that this request failed
 * because a service is down (instrumentation.ts for a page whose render threw, lib/auth for
 * better-auth's endpoints). If the answer then starts with a 5xx and nothing has been sent yet, the
 * client gets the 503 outage answer instead (the page or JSON that proxy.ts sends for new requests);
 * whatever Next writes after that is dropped. An answer already streaming keeps its status (its
 * error boundary shows instead). The slot lives on globalThis: Next's bundled code runs in this
 * process and realm, and the storage follows the request through every await of its render.
 */
export function answerOutagesWith503(req, res, slot) {
  const { writeHead, write, end } = res;
  let replaced = false;
  const json = (req.url ?? "").startsWith("/api/");
  const replaceIfOutage = (status) => {
    if (replaced || res.headersSent || status < 500 || !slot.service) return replaced;
    replaced = true;
    // what Next set for its error page (length, compression, caching) does not fit this body;
    // the security headers it set stay
    for (const h of ["content-length", "content-encoding", "etag", "last-modified", "transfer-encoding", "x-nextjs-cache", "x-nextjs-prerender"]) res.removeHeader(h);
    res.setHeader("content-type", json ? "application/json" : "text/html; charset=utf-8");
    res.setHeader("cache-control", "no-store");
    res.setHeader("retry-after", String(OUTAGE_RETRY_AFTER_S));
    res.statusCode = 503;
    return true;
  };
  res.writeHead = function (status, ...rest) {
    if (replaceIfOutage(status)) {
      res.removeHeader("content-encoding"); // a compression layer above may have set it just now
      return writeHead.call(this, 503);
    }
    return writeHead.call(this, status, ...rest);
  };
  res.write = function (chunk, encoding, cb) {
    if (!replaceIfOutage(res.statusCode)) return write.call(this, chunk, encoding, cb);
    (typeof encoding === "function" ? encoding : cb)?.();
    return true;
  };
  res.end = function (chunk, encoding, cb) {
    if (!replaceIfOutage(res.statusCode)) return end.call(this, chunk, encoding, cb);
    const done = [chunk, encoding, cb].find((a) => typeof a === "function");
    const body = json ? JSON.stringify({ error: outageMessage(slot.service) }) : outagePage(slot.service);
    if (!res.headersSent) res.setHeader("content-length", Buffer.byteLength(body));
    return end.call(this, body, done);
  };
}
