/**
 * Fail fast at start: loads the typed environment (lib/env validates it with zod) and stops the
 * process with its message when something is missing or malformed, instead of failing on the
 * first request that needs the database or mail.
 */
export async function checkEnvironmentAtStart(): Promise<void> {
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  try {
    await import("@/lib/env");
  } catch (err) {
    const { log } = await import("@/lib/log");
    log().fatal(`\n${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  }
}
