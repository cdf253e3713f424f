import { spawn, spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";

export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: "inherit", ...opts });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited with ${r.status}`);
  return r;
}

export function has(cmd) {
  return spawnSync("sh", ["-c", `command -v ${cmd}`], { stdio: "ignore" }).status === 0;
}

export function pidAlive(pid) {
  if (!pid) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export function readPid(file) {
  if (!existsSync(file)) return null;
  const pid = Number(readFileSync(file, "utf8").trim());
  return Number.isInteger(pid) && pid > 0 ? pid : null;
}

export const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Installs Debian packages when a command is missing; a clear message when that is impossible. */
export function ensureDebian(commands, packages, why) {
  if (commands.every(has)) return;
  console.log(`[setup] ${why}: installing ${packages.join(", ")} with apt-get ...`);
  const root = process.getuid?.() === 0;
  if (!root && !has("sudo")) {
    throw new Error(`${packages.join(", ")} missing and not running as root. Run: sudo apt-get install -y ${packages.join(" ")}`);
  }
  const apt = (args) =>
    spawnSync(root ? "apt-get" : "sudo", root ? args : ["-n", "apt-get", ...args], {
      stdio: "inherit",
      env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
    });
  let r = apt(["install", "-y", "--no-install-recommends", ...packages]);
  if (r.status !== 0) {
    apt(["update"]);
    r = apt(["install", "-y", "--no-install-recommends", ...packages]);
  }
  if (r.status !== 0 || !commands.every(has)) {
    throw new Error(`Could not install ${packages.join(", ")}. Install them (apt-get install -y ${packages.join(" ")}) and run the command again.`);
  }
}

/** Starts a detached background process that outlives this script. */
export function spawnDetached(cmd, args, opts = {}) {
  const child = spawn(cmd, args, { detached: true, stdio: "ignore", ...opts });
  child.unref();
  return child;
}
