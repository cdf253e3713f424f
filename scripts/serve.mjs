#!/usr/bin/env node
// Riser's HTTP server: Next's request handler behind a plain Node server that tells the app who is
// really connected. `next start` fills X-Forwarded-For with the peer address only when a request
// arrives without one, so a forged value would survive; here the socket's address is always
// appended, and the app (lib/client-ip) counts TRUSTED_PROXY_HOPS addresses from the right.
// It also keeps outages to 503: a request already past proxy.ts's database probe when the database
// dropped would otherwise end as Next's 500 error page (see answerOutagesWith503 below).
//   node scripts/serve.mjs [--dev] [-H 127.0.0.1] [-p 3000]
// npm start, npm test and npm run bench start the app with this; use it in production too.
import { AsyncLocalStorage } from "node:async_hooks";
import { createServer } from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import next from "next";
import { OUTAGE_RETRY_AFTER_S, OUTAGE_SLOT, outageMessage, outagePage } from "../lib/outage.mjs";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const args = process.argv.slice(2);
const arg = (short, long, fallback) => {
  const i = args.findIndex((a) => a === short || a === long);
  return i >= 0 && args[i + 1] ? args[i + 1] : fallback;
};
const dev = args.includes("--dev");
const hostname = arg("-H", "--hostname", process.env.HOST || "127.0.0.1");
const port = Number(arg("-p", "--port", process.env.PORT || "3000"));

/** The request's X-Forwarded-For with the connected peer's address appended (IPv4-mapped IPv6 as IPv4). */
function withPeer(forwarded, peer) {
  const address = (peer || "unknown").replace(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/, "$1");
  const prior = (Array.isArray(forwarded) ? forwarded.join(", ") : forwarded || "").trim();
  return prior ? `${prior}, ${address}` : address;
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
const outages = new AsyncLocalStorage();
globalThis[OUTAGE_SLOT] = outages;

function answerOutagesWith503(req, res, slot) {
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

const app = next({ dev, dir: root, hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

const server = createServer((req, res) => {
  req.headers["x-forwarded-for"] = withPeer(req.headers["x-forwarded-for"], req.socket.remoteAddress);
  const slot = {};
  answerOutagesWith503(req, res, slot);
  outages.run(slot, () => handle(req, res)).catch((err) => {
    console.error("[serve] unhandled error", err);
    if (!res.headersSent) {
      res.statusCode = 500;
      res.end("Internal error");
    }
  });
});
server.listen(port, hostname, () => console.log(`[serve] Riser listening on http://${hostname}:${port}${dev ? " (development)" : ""}`));

let closing = false;
function close() {
  if (closing) return;
  closing = true;
  server.close(() => process.exit(0));
  server.closeIdleConnections?.();
  setTimeout(() => process.exit(0), 4000).unref();
}
process.on("SIGTERM", close);
process.on("SIGINT", close);
