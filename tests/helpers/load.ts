// Steady load for the fault tests and bench/outage.ts: each client asks for its paths one after the
// other, as fast as the app answers, and every answer is kept (time, path, status, the start of the
// body of anything that is not a 2xx/3xx), so that a test can look at what came back during an
// outage and a bench can count it per second. A request the app never answers is kept as status 0.
import type { Client } from "./http";

/** `sentAt` when the request left, `at` when its answer (or failure) came back. */
export type Hit = { sentAt: number; at: number; path: string; status: number; body?: string; error?: string };

export type Load = {
  hits: Hit[];
  /** Stops asking, waits for the requests in flight, and returns every answer. */
  stop: () => Promise<Hit[]>;
};

export function startLoad(clients: Client[], paths: string[], opts: { timeoutMs?: number } = {}): Load {
  const hits: Hit[] = [];
  let running = true;
  const one = async (client: Client, path: string) => {
    const sentAt = Date.now();
    try {
      const res = await client.fetch(path, { signal: AbortSignal.timeout(opts.timeoutMs ?? 30_000) });
      const text = await res.text();
      hits.push({ sentAt, at: Date.now(), path, status: res.status, ...(res.status >= 400 ? { body: text.slice(0, 400) } : {}) });
    } catch (err) {
      hits.push({ sentAt, at: Date.now(), path, status: 0, error: err instanceof Error ? `${err.name}: ${err.message}` : String(err) });
      await new Promise((r) => setTimeout(r, 50)); // a refused connection returns at once: do not spin
    }
  };
  const loops = clients.map(async (client, i) => {
    for (let n = i; running; n++) await one(client, paths[n % paths.length]!);
  });
  return {
    hits,
    stop: async () => {
      running = false;
      await Promise.all(loops);
      return hits;
    },
  };
}

/** Answers per second since `t0` by status class: [{ s, "2xx": n, "503": n, … }]. */
export function perSecond(hits: Hit[], t0: number): Record<string, number>[] {
  const rows: Record<string, number>[] = [];
  for (const h of hits) {
    const s = Math.floor((h.at - t0) / 1000);
    if (s < 0) continue;
    const key = h.status === 0 ? "no answer" : h.status === 503 || h.status >= 500 ? String(h.status) : `${Math.floor(h.status / 100)}xx`;
    const row = (rows[s] ??= { s });
    row[key] = (row[key] ?? 0) + 1;
  }
  return Array.from(rows, (r, s) => r ?? { s });
}
