#!/usr/bin/env node
// Local mail catcher (development and tests only): an SMTP server on 127.0.0.1 that keeps every
// message in memory and lists them over HTTP for /dev/mail and the tests.
//   node scripts/mail-catcher.mjs start|stop|serve [--profile=dev|test]
// HTTP: GET /messages · GET /messages/:id · DELETE /messages
import { createServer } from "node:http";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { config } from "./lib/config.mjs";
import { daemon } from "./lib/daemon.mjs";
import { rmSync } from "node:fs";

const cfg = config();
const pidFile = path.join(cfg.dir, "mail-catcher.pid");
const MAX = 2000;

function serve() {
  const messages = [];
  let seq = 0;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((m) => {
          messages.unshift({
            id: String(++seq),
            at: new Date().toISOString(),
            from: m.from?.text ?? "",
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: m.subject ?? "",
            text: m.text ?? "",
            html: typeof m.html === "string" ? m.html : null,
          });
          if (messages.length > MAX) messages.length = MAX;
          callback();
        })
        .catch(callback);
    },
  });
  smtp.listen(cfg.smtpPort, "127.0.0.1");
  const http = createServer((req, res) => {
    const send = (status, body) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const url = new URL(req.url ?? "/", "http://x");
    if (req.method === "GET" && url.pathname === "/messages") {
      const to = url.searchParams.get("to");
      return send(200, to ? messages.filter((m) => m.to.includes(to.toLowerCase()) || m.to.includes(to)) : messages);
    }
    const one = url.pathname.match(/^\/messages\/(\d+)$/);
    if (req.method === "GET" && one) {
      const m = messages.find((x) => x.id === one[1]);
      return m ? send(200, m) : send(404, { error: "no such message" });
    }
    if (req.method === "DELETE" && url.pathname === "/messages") {
      messages.length = 0;
      return send(200, { ok: true });
    }
    if (url.pathname === "/health") return send(200, { ok: true, count: messages.length });
    send(404, { error: "not found" });
  });
  http.listen(cfg.mailHttpPort, "127.0.0.1");
  const shut = () => {
    smtp.close();
    http.close();
    rmSync(pidFile, { force: true });
    process.exit(0);
  };
  process.on("SIGTERM", shut);
  process.on("SIGINT", shut);
}

async function healthy() {
  try {
    const r = await fetch(`http://127.0.0.1:${cfg.mailHttpPort}/health`);
    return r.ok;
  } catch {
    return false;
  }
}

const { start, stop } = daemon({
  tag: `mail:${cfg.name}`,
  dir: cfg.dir,
  pidFile,
  script: new URL(import.meta.url).pathname,
  profile: cfg.name,
  healthy,
  ready: `SMTP 127.0.0.1:${cfg.smtpPort}, messages at http://127.0.0.1:${cfg.mailHttpPort}/messages`,
});

const cmd = process.argv[2];
if (cmd === "serve") serve();
else if (cmd === "start") await start();
else if (cmd === "stop") await stop();
else {
  console.error("usage: node scripts/mail-catcher.mjs start|stop|serve [--profile=dev|test]");
  process.exit(2);
}
