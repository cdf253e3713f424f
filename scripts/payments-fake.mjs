#!/usr/bin/env node
// Over 300 lines on purpose: one self-contained fake service (API, webhook signing and delivery,
// local pay page, fault switches) that runs as its own process with no imports from the app.
// Local fake of the payment provider's API (development and tests only). Riser's server talks to
// it through the provider's own SDK (lib/billing/provider.ts), pointed here by STRIPE_API_HOST/
// PORT/PROTOCOL. It implements only what Riser uses:
//   POST /v1/checkout/sessions   form-encoded, as the SDK sends it; honours Idempotency-Key
//   GET  /pay/:id                a local checkout page (Riser's own test page, no card, no money)
//   POST /pay/:id/pay|decline    marks the session and sends a signed webhook event to the app
// and, for tests: GET /_fake/sessions · GET /_fake/events · POST /_fake/events/:id/resend ·
// POST /_fake/faults {"dropResponses": n} (the next n creates are stored but their answer is lost).
// It listens on 127.0.0.1 only and sends nothing anywhere but the app's own webhook URL.
//   node scripts/payments-fake.mjs start|stop|serve [--profile=dev|test|test-a…]
import { createServer } from "node:http";
import { createHash, randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import Stripe from "stripe";
import { config } from "./lib/config.mjs";
import { daemon } from "./lib/daemon.mjs";
import { sleep } from "./lib/proc.mjs";

const cfg = config();
const pidFile = path.join(cfg.dir, "payments-fake.pid");
const stateFile = path.join(cfg.dir, "payments-fake.json");
const BASE = `http://127.0.0.1:${cfg.payPort}`;
const API_KEY = cfg.env.STRIPE_SECRET_KEY;
const WEBHOOK_SECRET = cfg.env.STRIPE_WEBHOOK_SECRET;
const WEBHOOK_URL = `${cfg.env.APP_URL}/api/billing/webhook`;
const KEEP = 1000; // sessions and events kept (oldest dropped)
const RETRY_DELAYS_MS = [1000, 3000, 10_000]; // redelivery after a failed webhook

const rand = (n) => randomBytes(n).toString("base64url").replace(/[-_]/g, "").slice(0, n);
const now = () => Math.floor(Date.now() / 1000);
const esc = (s) => String(s ?? "").replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);
const money = (minor, currency) => new Intl.NumberFormat("en-US", { style: "currency", currency: String(currency).toUpperCase() }).format(minor / 100);

// ---------------------------------------------------------------------------------------------
// state (kept in a JSON file so that a restart forgets nothing, as a real service would)

function loadState() {
  try {
    const s = JSON.parse(readFileSync(stateFile, "utf8"));
    return { sessions: s.sessions ?? {}, idempotency: s.idempotency ?? {}, events: s.events ?? [], faults: { dropResponses: 0 } };
  } catch {
    return { sessions: {}, idempotency: {}, events: [], faults: { dropResponses: 0 } };
  }
}
const state = loadState();

function save() {
  const ids = Object.keys(state.sessions);
  for (const id of ids.slice(0, Math.max(0, ids.length - KEEP))) delete state.sessions[id];
  const keys = Object.keys(state.idempotency);
  for (const k of keys.slice(0, Math.max(0, keys.length - KEEP))) delete state.idempotency[k];
  if (state.events.length > KEEP) state.events.splice(0, state.events.length - KEEP);
  const tmp = `${stateFile}.tmp`;
  writeFileSync(tmp, JSON.stringify({ sessions: state.sessions, idempotency: state.idempotency, events: state.events }));
  renameSync(tmp, stateFile);
}

// ---------------------------------------------------------------------------------------------
// the provider's API, as far as Riser uses it

/** `a[0][b]=1&c=2` (the SDK's form encoding) → { a: [{ b: "1" }], c: "2" } */
function parseForm(body) {
  const out = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const parts = rawKey.split(/\]\[|\[|\]/).filter((p, i) => i === 0 || p !== "");
    let node = out;
    parts.forEach((part, i) => {
      if (i === parts.length - 1) node[part] = value;
      else node = node[part] ??= /^\d+$/.test(parts[i + 1]) ? [] : {};
    });
  }
  return out;
}

class ApiFault extends Error {
  constructor(status, type, message, param) {
    super(message);
    Object.assign(this, { status, type, param });
  }
}

const int = (v, param, min = 0) => {
  if (v === undefined || !/^-?\d+$/.test(String(v)) || Number(v) < min) throw new ApiFault(400, "invalid_request_error", `Invalid integer: ${v ?? "(missing)"}`, param);
  return Number(v);
};

function createSession(p, apiVersion) {
  if (p.mode !== "payment") throw new ApiFault(400, "invalid_request_error", "This test service only supports mode=payment.", "mode");
  if (!p.success_url) throw new ApiFault(400, "invalid_request_error", "Missing required param: success_url.", "success_url");
  const items = Array.isArray(p.line_items) ? p.line_items : [];
  if (items.length === 0) throw new ApiFault(400, "invalid_request_error", "Missing required param: line_items.", "line_items");
  const lines = items.map((li, i) => {
    const pd = li?.price_data;
    if (!pd) throw new ApiFault(400, "invalid_request_error", "This test service only supports line_items with price_data.", `line_items[${i}][price_data]`);
    if (!pd.currency || !/^[a-z]{3}$/.test(pd.currency)) throw new ApiFault(400, "invalid_request_error", "Invalid currency.", `line_items[${i}][price_data][currency]`);
    if (!pd.product_data?.name) throw new ApiFault(400, "invalid_request_error", "Missing required param: product_data[name].", `line_items[${i}][price_data][product_data][name]`);
    return {
      name: pd.product_data.name,
      currency: pd.currency,
      unit_amount: int(pd.unit_amount, `line_items[${i}][price_data][unit_amount]`),
      quantity: int(li.quantity, `line_items[${i}][quantity]`, 1),
    };
  });
  const currency = lines[0].currency;
  if (lines.some((l) => l.currency !== currency)) throw new ApiFault(400, "invalid_request_error", "All line items must use the same currency.", "line_items");
  const total = lines.reduce((n, l) => n + l.unit_amount * l.quantity, 0);
  const id = `cs_test_${rand(40)}`;
  const created = now();
  const session = {
    id,
    object: "checkout.session",
    amount_subtotal: total,
    amount_total: total,
    cancel_url: p.cancel_url ?? null,
    client_reference_id: p.client_reference_id ?? null,
    created,
    currency,
    customer: null,
    customer_email: p.customer_email ?? null,
    expires_at: created + 24 * 3600,
    livemode: false,
    metadata: p.metadata ?? {},
    mode: "payment",
    payment_intent: null,
    payment_status: "unpaid",
    status: "open",
    success_url: p.success_url,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    url: `${BASE}/pay/${id}`,
  };
  state.sessions[id] = { session, lines, apiVersion };
  return session;
}

// ---------------------------------------------------------------------------------------------
// webhook events, signed with the SDK's own test-header helper

function newEvent(type, entry) {
  const evt = {
    id: `evt_test_${rand(32)}`,
    object: "event",
    api_version: entry.apiVersion ?? null,
    created: now(),
    data: { object: { ...entry.session } },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
  };
  const record = { id: evt.id, type, sessionId: entry.session.id, payload: evt, deliveries: [] };
  state.events.push(record);
  save();
  return record;
}

async function deliverOnce(record) {
  const payload = JSON.stringify(record.payload, null, 2);
  const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
  let status = 0;
  let error = null;
  try {
    const res = await fetch(WEBHOOK_URL, {
      method: "POST",
      headers: { "content-type": "application/json; charset=utf-8", "stripe-signature": header, "user-agent": "Riser-payments-fake/1" },
      body: payload,
      signal: AbortSignal.timeout(15_000),
    });
    status = res.status;
    await res.arrayBuffer();
  } catch (err) {
    error = err instanceof Error ? err.message : String(err);
  }
  record.deliveries.push({ at: new Date().toISOString(), status, error });
  save();
  return status;
}

/** First attempt now (awaited); on failure, retries later in the background, as a real service would. */
async function deliver(record) {
  const status = await deliverOnce(record);
  if (status >= 200 && status < 300) return status;
  (async () => {
    for (const ms of RETRY_DELAYS_MS) {
      await sleep(ms);
      const s = await deliverOnce(record);
      if (s >= 200 && s < 300) return;
    }
  })();
  return status;
}

// ---------------------------------------------------------------------------------------------
// the local checkout page (Riser's own words and look; no card, no money)

function page(title, body) {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${esc(title)}</title>
<style>
body{font-family:system-ui,sans-serif;background:#F7F4EE;color:#14202B;margin:0;line-height:1.5}
main{max-width:34rem;margin:0 auto;padding:1.5rem 1rem}
.note{border:2px dashed #1B617A;background:#DCECF1;padding:.75rem 1rem;border-radius:4px}
dl{display:grid;grid-template-columns:auto minmax(0,1fr);gap:.25rem 1rem;background:#fff;border:1px solid #D5CFC3;border-radius:4px;padding:1rem}
dt{color:#56616B}dd{margin:0;font-family:ui-monospace,monospace;overflow-wrap:anywhere}
.actions{display:flex;flex-wrap:wrap;gap:.75rem;margin-top:1.25rem}
button{min-height:44px;padding:.5rem 1.25rem;font:inherit;font-weight:700;border-radius:4px;cursor:pointer}
.pay{background:#9A4F12;color:#fff;border:1px solid #9A4F12}.decline{background:#fff;color:#14202B;border:1px solid #14202B}
a{color:#1B617A}
</style></head><body><main>${body}</main></body></html>`;
}

function payPage(entry) {
  const s = entry.session;
  const total = money(s.amount_total, s.currency);
  const rows = entry.lines
    .map((l) => `<dt>Item</dt><dd>${esc(l.name)}</dd><dt>Quantity</dt><dd>${l.quantity} × ${esc(money(l.unit_amount, l.currency))}</dd>`)
    .join("");
  const head = `<h1>Riser test checkout</h1>
<p class="note"><strong>Local test service.</strong> This page stands in for the payment service on this computer. No card is asked for and no money moves. Choose what the buyer does.</p>`;
  const details = `<dl>${rows}<dt>Total</dt><dd data-testid="fake-total">${esc(total)}</dd>${s.customer_email ? `<dt>Buyer</dt><dd>${esc(s.customer_email)}</dd>` : ""}<dt>Reference</dt><dd>${esc(s.id)}</dd></dl>`;
  if (s.status === "complete") {
    return page("Already paid", `${head}${details}<p><strong>This checkout is already paid.</strong> Paying twice is not possible.</p><p><a href="${esc(successUrl(s))}">Back to Riser</a></p>`);
  }
  if (s.status === "expired") {
    return page("Checkout ended", `${head}${details}<p><strong>This checkout ended without payment.</strong> Start a new one in Riser.</p>${s.cancel_url ? `<p><a href="${esc(s.cancel_url)}">Back to Riser</a></p>` : ""}`);
  }
  return page(
    `Pay ${total}`,
    `${head}${details}
<div class="actions">
<form method="post" action="/pay/${esc(s.id)}/pay"><button class="pay" type="submit">Pay ${esc(total)}</button></form>
<form method="post" action="/pay/${esc(s.id)}/decline"><button class="decline" type="submit">Decline</button></form>
</div>
${s.cancel_url ? `<p><a href="${esc(s.cancel_url)}">Back to Riser without deciding</a></p>` : ""}`,
  );
}

const successUrl = (s) => s.success_url.replaceAll("{CHECKOUT_SESSION_ID}", s.id);

// ---------------------------------------------------------------------------------------------
// HTTP

function readBody(req, limit = 1024 * 1024) {
  return new Promise((resolve, reject) => {
    let size = 0;
    const chunks = [];
    req.on("data", (c) => {
      size += c.length;
      if (size > limit) reject(new ApiFault(413, "invalid_request_error", "Request too large."));
      else chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function sendJson(res, status, body, headers = {}) {
  res.writeHead(status, { "content-type": "application/json", "request-id": `req_${rand(14)}`, ...headers });
  res.end(JSON.stringify(body));
}

function sendHtml(res, status, html) {
  res.writeHead(status, { "content-type": "text/html; charset=utf-8", "cache-control": "no-store" });
  res.end(html);
}

function authorised(req) {
  const h = req.headers.authorization ?? "";
  return h === `Bearer ${API_KEY}`;
}

async function handleCreate(req, res) {
  if (!authorised(req)) {
    return sendJson(res, 401, { error: { type: "invalid_request_error", message: "Invalid API key provided to the local test service." } });
  }
  const raw = await readBody(req);
  const params = parseForm(raw);
  const key = req.headers["idempotency-key"];
  const hash = createHash("sha256").update(raw).digest("hex");
  if (key && state.idempotency[key]) {
    const prior = state.idempotency[key];
    if (prior.hash !== hash) {
      return sendJson(res, 400, {
        error: { type: "idempotency_error", message: "Keys for idempotent requests can only be used with the same parameters they were first used with." },
      });
    }
    return sendJson(res, prior.status, prior.body, { "idempotent-replayed": "true" });
  }
  let status = 200;
  let body;
  try {
    body = createSession(params, req.headers["stripe-version"]);
  } catch (err) {
    if (!(err instanceof ApiFault)) throw err;
    status = err.status;
    body = { error: { type: err.type, message: err.message, ...(err.param ? { param: err.param } : {}) } };
  }
  if (key) state.idempotency[key] = { hash, status, body };
  save();
  if (state.faults.dropResponses > 0) {
    state.faults.dropResponses--;
    req.socket.destroy(); // the session exists, the answer never arrives
    return;
  }
  sendJson(res, status, body);
}

async function handle(req, res) {
  const url = new URL(req.url ?? "/", BASE);
  const p = url.pathname;
  if (req.method === "GET" && p === "/health") return sendJson(res, 200, { ok: true, sessions: Object.keys(state.sessions).length });

  if (req.method === "POST" && p === "/v1/checkout/sessions") return handleCreate(req, res);
  if (p.startsWith("/v1/")) return sendJson(res, 404, { error: { type: "invalid_request_error", message: `The local test service does not implement ${req.method} ${p}.` } });

  const pay = p.match(/^\/pay\/([A-Za-z0-9_]+)(?:\/(pay|decline))?$/);
  if (pay) {
    const entry = state.sessions[pay[1]];
    if (!entry) return sendHtml(res, 404, page("Unknown checkout", "<h1>Unknown checkout</h1><p>The local test service has no checkout with this reference. Go back to Riser and start again.</p>"));
    const s = entry.session;
    if (req.method === "GET" && !pay[2]) return sendHtml(res, 200, payPage(entry));
    if (req.method === "POST" && pay[2]) {
      await readBody(req);
      if (s.status !== "open") return sendHtml(res, 409, payPage(entry));
      if (pay[2] === "pay") {
        s.status = "complete";
        s.payment_status = "paid";
        s.payment_intent = `pi_test_${rand(24)}`;
        await deliver(newEvent("checkout.session.completed", entry));
        res.writeHead(303, { location: successUrl(s) });
      } else {
        s.status = "expired";
        await deliver(newEvent("checkout.session.expired", entry));
        res.writeHead(303, { location: s.cancel_url ?? `${BASE}/pay/${s.id}` });
      }
      return res.end();
    }
  }

  // test controls
  if (req.method === "GET" && p === "/_fake/sessions") {
    const ref = url.searchParams.get("client_reference_id");
    const list = Object.values(state.sessions).filter((e) => !ref || e.session.client_reference_id === ref);
    return sendJson(res, 200, list.map((e) => ({ ...e.session, line_items: e.lines })));
  }
  if (req.method === "GET" && p === "/_fake/events") {
    const sid = url.searchParams.get("session");
    return sendJson(res, 200, state.events.filter((e) => !sid || e.sessionId === sid));
  }
  const resend = p.match(/^\/_fake\/events\/([A-Za-z0-9_]+)\/resend$/);
  if (req.method === "POST" && resend) {
    const record = state.events.find((e) => e.id === resend[1]);
    if (!record) return sendJson(res, 404, { error: "no such event" });
    return sendJson(res, 200, { status: await deliverOnce(record) });
  }
  if (req.method === "POST" && p === "/_fake/faults") {
    const body = JSON.parse((await readBody(req)) || "{}");
    state.faults.dropResponses = Math.max(0, Number(body.dropResponses) || 0);
    return sendJson(res, 200, state.faults);
  }
  sendJson(res, 404, { error: "not found" });
}

function serve() {
  mkdirSync(cfg.dir, { recursive: true });
  const server = createServer((req, res) => {
    handle(req, res).catch((err) => {
      console.error("[payments-fake]", err);
      if (!res.headersSent) sendJson(res, err instanceof ApiFault ? err.status : 500, { error: { type: "api_error", message: err.message } });
      else res.end();
    });
  });
  server.listen(cfg.payPort, "127.0.0.1");
  const shut = () => {
    server.close();
    rmSync(pidFile, { force: true });
    process.exit(0);
  };
  process.on("SIGTERM", shut);
  process.on("SIGINT", shut);
}

async function healthy() {
  try {
    const r = await fetch(`${BASE}/health`);
    return r.ok;
  } catch {
    return false;
  }
}

const { start, stop } = daemon({
  tag: `payments:${cfg.name}`,
  dir: cfg.dir,
  pidFile,
  script: new URL(import.meta.url).pathname,
  profile: cfg.name,
  healthy,
  ready: `local payment service at ${BASE} (webhooks to ${WEBHOOK_URL})`,
});

const cmd = process.argv[2];
if (cmd === "serve") serve();
else if (cmd === "start") await start();
else if (cmd === "stop") await stop();
else {
  console.error("usage: node scripts/payments-fake.mjs start|stop|serve [--profile=dev|test|test-a…]");
  process.exit(2);
}
