// Runs once when the server starts (Next.js instrumentation hook): the environment is checked
// before the first request, so a missing variable stops `next start` with a clear message.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { checkEnvironmentAtStart } = await import("./lib/startup");
  await checkEnvironmentAtStart();
}
