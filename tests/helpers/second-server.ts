/**
 * A second app server for tests/integration/two-servers.test.ts: the same production build, started
 * with scripts/serve.mjs and the same environment as the first (same MariaDB, same secrets, same
 * APP_URL, as two instances behind one load balancer), on the first server's port + 5. Started by the
 * test file that needs it and stopped by it, pass or fail.
 */
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { APP, fetchFrom, freshIp, type Client } from "./http";

export type SecondServer = { url: string; stop: () => Promise<void> };

const healthy = (url: string) =>
  fetch(`${url}/api/health`)
    .then((r) => r.status === 200)
    .catch(() => false);

export async function startSecondServer(timeoutMs = 120_000): Promise<SecondServer> {
  const first = new URL(APP);
  const port = Number(first.port) + 5;
  const url = `http://127.0.0.1:${port}`;
  if (await healthy(url)) throw new Error(`something already answers on ${url}: stop it before this test`);
  const child: ChildProcess = spawn(process.execPath, [path.resolve("scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], {
    cwd: path.resolve("."),
    env: { ...process.env, NODE_ENV: "production" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  const keep = (b: Buffer) => (output = (output + b.toString()).slice(-4000));
  child.stdout!.on("data", keep);
  child.stderr!.on("data", keep);
  const killOnExit = () => child.kill("SIGKILL");
  process.once("exit", killOnExit);

  async function stop() {
    process.removeListener("exit", killOnExit);
    if (child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise((r) => child.once("exit", r));
    child.kill("SIGTERM");
    const timer = setTimeout(() => child.kill("SIGKILL"), 5000);
    await exited;
    clearTimeout(timer);
  }

  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) break;
    if (await healthy(url)) return { url, stop };
    await new Promise((r) => setTimeout(r, 250));
  }
  await stop();
  throw new Error(`the second app server did not answer /api/health on ${url}:\n${output}`);
}

/** The same client (cookie, source address) talking to another server; Origin stays the public APP_URL. */
export function via(base: string, client: Pick<Client, "cookie" | "ip">): Client {
  const { cookie, ip } = client;
  return {
    cookie,
    ip,
    fetch: (p, init = {}) =>
      fetchFrom(ip, `${base}${p}`, { redirect: "manual", ...init, headers: { origin: APP, ...(cookie ? { cookie } : {}), ...(init.headers as Record<string, string> | undefined) } }),
  };
}

/** A password sign-in sent to one server (no second step). */
export const passwordSignIn = (base: string, email: string, password: string, ip = freshIp()) =>
  fetchFrom(ip, `${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP },
    body: JSON.stringify({ email, password }),
  });
