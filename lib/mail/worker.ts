import "server-only";
import { drainNow } from "./outbox";

/** Interval between outbox runs in each app server (the jobs' "mail-outbox" entry runs the same). */
export const OUTBOX_INTERVAL_MS = 2_000;

const g = globalThis as unknown as { riserOutboxWorker?: NodeJS.Timeout };

/** Started once per server process from instrumentation.ts. */
export function startOutboxWorker(): void {
  if (g.riserOutboxWorker) return;
  g.riserOutboxWorker = setInterval(() => void drainNow(), OUTBOX_INTERVAL_MS);
  g.riserOutboxWorker.unref?.();
}
