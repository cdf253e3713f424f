// Start/stop for the local fake services (mail catcher, S3, payments): each runs its own script
// with "serve" as a detached process, recorded in a pid file, and is ready when healthy() says so.
import { mkdirSync, openSync, rmSync, writeFileSync } from "node:fs";
import { pidAlive, readPid, sleep, spawnDetached } from "./proc.mjs";

/**
 * @param {{ tag: string, dir: string, pidFile: string, script: string, profile: string,
 *   healthy: () => Promise<boolean>, ready: string, logFile?: string, beforeStart?: () => void }} o
 */
export function daemon(o) {
  async function start() {
    if (pidAlive(readPid(o.pidFile)) && (await o.healthy())) {
      console.log(`[${o.tag}] already running`);
      return;
    }
    mkdirSync(o.dir, { recursive: true });
    o.beforeStart?.();
    const stdio = o.logFile ? ["ignore", openSync(o.logFile, "a"), openSync(o.logFile, "a")] : "ignore";
    const child = spawnDetached(process.execPath, [o.script, "serve", `--profile=${o.profile}`], { stdio });
    writeFileSync(o.pidFile, String(child.pid));
    for (let i = 0; i < 100; i++) {
      if (await o.healthy()) {
        console.log(`[${o.tag}] ${o.ready}`);
        return;
      }
      if (!pidAlive(child.pid)) break;
      await sleep(100);
    }
    throw new Error(`[${o.tag}] did not start${o.logFile ? ` (see ${o.logFile})` : ""}; is its port taken?`);
  }

  async function stop() {
    const pid = readPid(o.pidFile);
    if (!pidAlive(pid)) {
      rmSync(o.pidFile, { force: true });
      return console.log(`[${o.tag}] not running`);
    }
    process.kill(pid, "SIGTERM");
    for (let i = 0; i < 50 && pidAlive(pid); i++) await sleep(100);
    if (pidAlive(pid)) process.kill(pid, "SIGKILL");
    rmSync(o.pidFile, { force: true });
    console.log(`[${o.tag}] stopped`);
  }

  return { start, stop };
}
