import "server-only";
/**
 * Readiness of this app server: can it reach the database and the object store, and is the mail
 * outbox keeping up. GET /api/health/ready reports it (bearer METRICS_SECRET); /api/health/live
 * only says the process answers; /api/health (database only, public) stays for start scripts and
 * load balancers that cannot send a header.
 */
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { storeReachable } from "@/lib/storage";

/** A pending message due longer than this means the outbox is not keeping up. */
export const OUTBOX_LAG_LIMIT_S = 15 * 60;
const CHECK_TIMEOUT_MS = 3_000;

export type Check = { ok: boolean; ms: number; error?: string };
export type Readiness = {
  status: "ready" | "degraded" | "not ready";
  database: Check;
  objectStore: Check;
  mailOutbox: Check & { due?: number; oldestDueSeconds?: number; failedLastDay?: number };
};

function withTimeout<T>(p: Promise<T>, what: string): Promise<T> {
  let timer: NodeJS.Timeout;
  return Promise.race([
    p.finally(() => clearTimeout(timer)),
    new Promise<T>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`${what} did not answer within ${CHECK_TIMEOUT_MS / 1000} s`)), CHECK_TIMEOUT_MS);
    }),
  ]);
}

async function timed<T>(what: string, fn: () => Promise<T>): Promise<Check & { value?: T }> {
  const t0 = Date.now();
  try {
    const value = await withTimeout(fn(), what);
    return { ok: true, ms: Date.now() - t0, value };
  } catch (err) {
    // a short reason for operators: no connection strings, hosts with credentials or stack traces
    const message = err instanceof Error ? err.message.split("\n")[0]!.replace(/\/\/[^@/\s]+@/g, "//") : String(err);
    return { ok: false, ms: Date.now() - t0, error: `${what}: ${message}`.slice(0, 200) };
  }
}

type OutboxRow = { due: number | string; oldest: number | string | null; failed: number | string };

export async function readiness(now = new Date()): Promise<Readiness> {
  const [database, objectStore, outbox] = await Promise.all([
    timed("database", () => db.execute(sql`select 1`)),
    timed("object store", () => storeReachable()),
    timed("mail outbox", async () => {
      const [rows] = (await db.execute(sql`
        SELECT COUNT(*) AS due,
               TIMESTAMPDIFF(SECOND, MIN(next_attempt_at), ${now}) AS oldest,
               (SELECT COUNT(*) FROM mail_outbox WHERE status = 'failed' AND next_attempt_at > ${new Date(now.getTime() - 86_400_000)}) AS failed
          FROM mail_outbox WHERE status = 'pending' AND next_attempt_at <= ${now}`)) as unknown as [OutboxRow[]];
      return rows[0]!;
    }),
  ]);
  const o = outbox.value;
  const oldest = o?.oldest === null || o?.oldest === undefined ? 0 : Number(o.oldest);
  const mailOutbox: Readiness["mailOutbox"] = o
    ? { ok: oldest <= OUTBOX_LAG_LIMIT_S, ms: outbox.ms, due: Number(o.due), oldestDueSeconds: oldest, failedLastDay: Number(o.failed), ...(oldest > OUTBOX_LAG_LIMIT_S ? { error: `the oldest due message has waited ${oldest} s` } : {}) }
    : { ok: false, ms: outbox.ms, error: outbox.error };
  const strip = ({ ok, ms, error }: Check): Check => ({ ok, ms, ...(error ? { error } : {}) });
  // a lagging outbox does not stop this server from serving: degraded, still ready
  const status = !database.ok || !objectStore.ok ? "not ready" : mailOutbox.ok ? "ready" : "degraded";
  return { status, database: strip(database), objectStore: strip(objectStore), mailOutbox };
}
