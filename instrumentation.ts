// Runs once when the server starts (Next.js instrumentation hook): the environment is checked
// before the first request, so a missing variable stops `next start` with a clear message; then the
// mail outbox worker starts (an interval in this process; lib/jobs.ts runs the same delivery).
import { isDatabaseDown } from "@/lib/db-errors";
import { noteOutage } from "@/lib/outage.mjs";

export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { checkEnvironmentAtStart } = await import("@/lib/startup");
  await checkEnvironmentAtStart();
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  const { startOutboxWorker } = await import("@/lib/mail");
  startOutboxWorker();
}

/**
 * Next calls this for an error it could not answer otherwise (a page or layout whose render threw,
 * the proxy), before the 500 goes out. A database outage is noted on the request, synchronously,
 * so that scripts/serve.mjs answers 503 with a clear message instead (lib/outage.mjs).
 */
export function onRequestError(err: unknown): void {
  if (isDatabaseDown(err)) noteOutage("database");
}
