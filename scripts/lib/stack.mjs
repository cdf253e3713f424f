// The one start-up sequence behind npm start, npm run dev, npm test and npm run bench:
// database → local services → migrate → seed → build → serve → wait for health, and the reverse
// on stop. Each caller picks a profile (scripts/lib/config.mjs) and what it needs of the sequence.
import { spawn } from "node:child_process";
import path from "node:path";
import { config, root } from "./config.mjs";
import { sleep } from "./proc.mjs";
import { SERVICES } from "./services.mjs";
import { buildApp, node, tsx } from "./steps.mjs";

const nextBin = path.join(root, "node_modules/next/dist/bin/next");

/**
 * @param {{ profile: string, mode?: "production" | "development", reset?: boolean,
 *   stdio?: "inherit" | "ignore", extraEnv?: Record<string, string> }} o
 */
export function stack({ profile, mode = "production", reset = false, stdio = "inherit", extraEnv = {} }) {
  const cfg = config(profile);
  const env = { ...process.env, ...cfg.env, NODE_ENV: mode, RISER_PROFILE: cfg.name, ...extraEnv };
  let server = null;

  /** MariaDB (emptied first when reset), the local fakes, migrations and demo data. */
  function prepare() {
    node("scripts/db.mjs", [reset ? "reset" : "start", `--profile=${cfg.name}`]);
    for (const s of SERVICES) node(s.script, ["start", `--profile=${cfg.name}`]);
    tsx("scripts/migrate.ts", [], env);
    tsx("scripts/seed/seed.ts", [], env);
  }

  /** A production build into the profile's own folder (skipped when sources are unchanged). */
  function build({ typesChecked = false } = {}) {
    buildApp({ distDir: cfg.env.NEXT_DIST_DIR, env, typesChecked });
  }

  /**
   * scripts/serve.mjs (Next's handler behind a server that appends the real peer address to
   * X-Forwarded-For), or `next dev` with hot reload in development mode; resolves when healthy.
   */
  async function serve() {
    const hostPort = ["-H", "127.0.0.1", "-p", String(cfg.appPort)];
    const cmd = mode === "development" ? [nextBin, "dev", ...hostPort] : [path.join(root, "scripts/serve.mjs"), ...hostPort];
    server = spawn(process.execPath, cmd, { cwd: root, env, stdio: ["ignore", stdio, stdio] });
    await waitForHealth(mode === "development" ? 600 : 300);
    return server;
  }

  async function waitForHealth(tries) {
    for (let i = 0; i < tries; i++) {
      if (server.exitCode !== null) throw new Error(`the app server exited with ${server.exitCode}`);
      const up = await fetch(`${cfg.env.APP_URL}/api/health`).then((r) => r.status === 200).catch(() => false);
      if (up) return;
      await sleep(200);
    }
    throw new Error(`the app did not answer /api/health within ${(tries * 0.2).toFixed(0)} s`);
  }

  /** Stops what start-up started, in reverse order; never throws. */
  async function stop() {
    if (server && server.exitCode === null) {
      // Next closes gracefully on SIGTERM but may wait on open connections: give it 5 s.
      const exited = new Promise((r) => server.once("exit", r));
      server.kill("SIGTERM");
      const timer = setTimeout(() => server.kill("SIGKILL"), 5000);
      await exited;
      clearTimeout(timer);
    }
    try {
      for (const s of [...SERVICES].reverse()) node(s.script, ["stop", `--profile=${cfg.name}`]);
      node("scripts/db.mjs", ["stop", `--profile=${cfg.name}`]);
    } catch (err) {
      console.error(err.message);
    }
  }

  return { cfg, env, prepare, build, serve, stop, get server() { return server; } };
}
