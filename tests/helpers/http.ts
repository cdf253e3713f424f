/** HTTP helpers for integration tests against the running app (started by scripts/test.mjs). */
import { Agent, fetch as undiciFetch } from "undici";
import { DEMO_PASSWORD } from "@/db/demo";
import { demoAdminCode, isDemoAdmin, sendUnusedCode } from "./totp";

export const APP = process.env.APP_URL ?? "http://127.0.0.1:3100";
export const MAIL = process.env.MAIL_CATCHER_URL ?? "http://127.0.0.1:2536";

const octet = () => 1 + Math.floor(Math.random() * 254);
/**
 * A random loopback address per caller (127.0.0.0/8 is all loopback on Linux), so that per-IP rate
 * limits of one test do not hit another. The requests really come from it: the app sees it as the
 * connected peer. No X-Forwarded-For is sent (the app ignores a forged one anyway).
 */
export const freshIp = () => `127.${octet()}.${octet()}.${octet()}`;

const agents = new Map<string, Agent>();
/** fetch whose connections leave from the given loopback address. */
export async function fetchFrom(ip: string, url: string, init: RequestInit = {}): Promise<Response> {
  let agent = agents.get(ip);
  if (!agent) agents.set(ip, (agent = new Agent({ localAddress: ip })));
  let { body, headers } = init;
  // Node's built-in FormData and Blob are not the undici package's classes: encode them with Node's own
  // Request first (same bytes and multipart boundary a browser would send).
  if (body instanceof FormData || body instanceof Blob || body instanceof URLSearchParams) {
    const encoded = new Request(url, { method: init.method ?? "POST", body });
    const merged = new Headers(headers);
    if (!merged.has("content-type") && encoded.headers.get("content-type")) merged.set("content-type", encoded.headers.get("content-type")!);
    body = Buffer.from(await encoded.arrayBuffer());
    headers = Object.fromEntries(merged.entries());
  }
  return (await undiciFetch(url, { ...(init as object), body, headers, dispatcher: agent } as Parameters<typeof undiciFetch>[1])) as unknown as Response;
}

export type Client = { cookie: string; ip: string; fetch: (path: string, init?: RequestInit) => Promise<Response> };

function clientFor(cookie: string, ip: string): Client {
  return {
    cookie,
    ip,
    fetch: (path, init = {}) =>
      fetchFrom(ip, `${APP}${path}`, {
        redirect: "manual",
        ...init,
        headers: { origin: APP, ...(cookie ? { cookie } : {}), ...(init.headers as Record<string, string> | undefined) },
      }),
  };
}

export const anonymous = (ip = freshIp()) => clientFor("", ip);

export function cookiesOf(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

/** Signs in with the password, and the code from `code()` when the account asks for one (the demo admin's by default). */
export async function signIn(email: string, password = DEMO_PASSWORD, ip = freshIp(), code?: () => string): Promise<Client> {
  const res = await fetchFrom(ip, `${APP}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${await res.text()}`);
  const body = (await res.json()) as { twoFactorRedirect?: boolean };
  if (!body.twoFactorRedirect) return clientFor(cookiesOf(res), ip);
  // two-step sign-in: the demo admin's code from the published demo key (tests/helpers/totp.ts)
  if (!code && !isDemoAdmin(email)) throw new Error(`sign-in of ${email} asks for a code; pass one`);
  // each code signs in once: the demo admin, signed in by many tests, takes the next unused one
  const pending = cookiesOf(res);
  const verify = (c: string, from: string) =>
    fetchFrom(from, `${APP}/api/auth/two-factor/verify-totp`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP, cookie: pending },
      body: JSON.stringify({ code: c }),
    });
  let tries = 0;
  const second = code ? await verify(code(), ip) : await sendUnusedCode(demoAdminCode, (c) => verify(c, tries++ ? freshIp() : ip));
  if (second.status !== 200) throw new Error(`second step of ${email} failed: ${second.status} ${await second.text()}`);
  return clientFor(cookiesOf(second), ip);
}

export async function postJson(client: Client, path: string, body: unknown, method = "POST") {
  const res = await client.fetch(path, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  const text = await res.text();
  let json: unknown = null;
  try {
    json = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, json: json as Record<string, unknown>, text };
}

type CaughtMail = { id: string; to: string[]; subject: string; text: string; at: string };

/** Waits for a mail to this address (optionally matching the subject) in the local catcher. */
export async function waitForMail(to: string, subject?: RegExp, timeoutMs = 10_000): Promise<CaughtMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const list = (await (await fetch(`${MAIL}/messages?to=${encodeURIComponent(to)}`)).json()) as CaughtMail[];
    const hit = list.find((m) => !subject || subject.test(m.subject));
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${to}${subject ? ` matching ${subject}` : ""} within ${timeoutMs} ms`);
}

export async function mailsTo(to: string): Promise<CaughtMail[]> {
  return (await (await fetch(`${MAIL}/messages?to=${encodeURIComponent(to)}`)).json()) as CaughtMail[];
}

export const linkIn = (text: string) => {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error(`no link in mail:\n${text}`);
  return m[0];
};

export const uniqueEmail = (tag: string) => `${tag}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}@test.example`;

export async function getJson<T = Record<string, unknown>>(client: Client, path: string): Promise<{ status: number; body: T }> {
  const res = await client.fetch(path);
  const text = await res.text();
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    body = text;
  }
  return { status: res.status, body: body as T };
}

export async function uploadRoster(client: Client, path: string, bytes: Uint8Array | string, fileName = "roster.csv", fields: Record<string, string> = {}) {
  const form = new FormData();
  const data = typeof bytes === "string" ? new TextEncoder().encode(bytes) : bytes;
  form.set("file", new Blob([Uint8Array.from(data)], { type: "text/csv" }), fileName);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  const res = await client.fetch(path, { method: "POST", body: form });
  return { status: res.status, json: (await res.json().catch(() => ({}))) as Record<string, unknown> };
}
