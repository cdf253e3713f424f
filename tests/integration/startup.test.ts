// Fail fast: `next start` with an incomplete environment stops at once with a message naming what is
// missing (lib/env.ts, called from instrumentation.ts), instead of serving pages that fail later.
import { spawn } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";

describe("start-up environment check", () => {
  it("exits non-zero and names the missing variables", async () => {
    const root = path.resolve(import.meta.dirname, "../..");
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production" };
    delete env.DATABASE_URL;
    env.BETTER_AUTH_SECRET = "too-short";
    const port = Number(new URL(process.env.APP_URL ?? "http://127.0.0.1:3100").port) + 7;
    const child = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-H", "127.0.0.1", "-p", String(port)], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
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
    expect(code, `the server kept running:\n${output}`).not.toBeNull();
    expect(code).not.toBe(0);
    expect(output).toContain("Riser cannot start: the environment is incomplete.");
    expect(output).toMatch(/DATABASE_URL: /);
    expect(output).toMatch(/BETTER_AUTH_SECRET: must be at least 32 characters/);
  });
});
