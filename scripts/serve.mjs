#!/usr/bin/env node
// Riser's HTTP server: Next's request handler behind a plain Node server that tells the app who is
// really connected. `next start` fills X-Forwarded-For with the peer address only when a request
// arrives without one, so a forged value would survive; here the socket's address is always
// appended, and the app (lib/client-ip) counts TRUSTED_PROXY_HOPS addresses from the right.
// It also keeps outages to 503: a request already past proxy.ts's database probe when the database
// dropped would otherwise end as Next's 500 error page (scripts/lib/outage-answer.mjs).
//   node scripts/serve.mjs [--dev] [-H 127.0.0.1] [-p 3000]
// npm start, npm test and npm run bench start the app with this; use it in production too.
import { createServer } from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import next from "next";
import { answerOutagesWith503, installOutageSlot } from "./lib/outage-answer.mjs";

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

const outages = installOutageSlot();

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
