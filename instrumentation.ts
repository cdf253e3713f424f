// Runs once when the server starts (Next.js instrumentation hook): the environment is checked
// before the first request, so a missing variable stops `next start` with a clear message; then the
// mail outbox worker starts (an interval in this process; lib/jobs.ts runs the same delivery).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { checkEnvironmentAtStart } = await import("@/lib/startup");
  await checkEnvironmentAtStart();
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  const { startOutboxWorker } = await import("@/lib/mail");
  startOutboxWorker();
}
