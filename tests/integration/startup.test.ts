// Fail fast: `next start` with an incomplete environment stops at once with a message naming what is
// missing (lib/env.ts, called from instrumentation.ts), instead of serving pages that fail later.
import { spawn } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";

/** Starts the production server (scripts/serve.mjs) with `env` on a spare port; resolves with its exit code and output (null: still running after 45 s). */
async function startWith(env: NodeJS.ProcessEnv, portOffset: number): Promise<{ code: number | null; output: string }> {
  const root = path.resolve(import.meta.dirname, "../..");
  const port = Number(new URL(process.env.APP_URL ?? "http://127.0.0.1:3100").port) + portOffset;
  const child = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout.on("data", (d) => (output += d));
  child.stderr.on("data", (d) => (output += d));
  const code = await new Promise<number | null>((resolve) => {
    const timer = setTimeout(() => {
      child.kill("SIGTERM");
      resolve(null);
    }, 45_000);
    child.once("exit", (c) => {
      clearTimeout(timer);
      resolve(c);
    });
  });
  return { code, output };
}

describe("start-up environment check", () => {
  it("refuses local conveniences on a production start that is not a local profile", async () => {
    // the test profile's own environment, minus the flag that only scripts/ set
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production" };
    delete env.RISER_LOCAL;
    const { code, output } = await startWith(env, 8);
    expect(code, `the server kept running:\n${output}`).not.toBeNull();
    expect(code).not.toBe(0);
    expect(output).toContain("Riser cannot start");
    expect(output).toMatch(/MAIL_CATCHER_URL: the local mail catcher/);
    expect(output).toMatch(/INSECURE_COOKIES: cookies without Secure/);
    expect(output).toMatch(/STRIPE_API_PROTOCOL: payment API calls over plain http/);
    expect(output).toMatch(/APP_URL: must be an https:\/\/ address in production/);
  });

  it("exits non-zero and names the missing variables", async () => {
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production" };
    delete env.DATABASE_URL;
    env.BETTER_AUTH_SECRET = "too-short";
    const { code, output } = await startWith(env, 7);
    expect(code, `the server kept running:\n${output}`).not.toBeNull();
    expect(code).not.toBe(0);
    expect(output).toContain("Riser cannot start: the environment is incomplete.");
    expect(output).toMatch(/DATABASE_URL: /);
    expect(output).toMatch(/BETTER_AUTH_SECRET: must be at least 32 characters/);
  });
});
