#!/usr/bin/env node
// The project's own MariaDB: node scripts/db.mjs start|stop|status|reset [--profile=dev|test]
// Installs mariadb-server from Debian when missing, keeps its data in .data/<profile>/mariadb,
// listens on 127.0.0.1 only. `start` is idempotent; `stop` waits for the server to exit.
import { existsSync, mkdirSync, rmSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { config } from "./lib/config.mjs";
import { ensureDebian, pidAlive, readPid, sleep, spawnDetached } from "./lib/proc.mjs";

const cfg = config();
const { db } = cfg;

function client(sql, { user = "root", database } = {}) {
  const args = ["--no-defaults", `--socket=${db.socket}`, `--user=${user}`, "--batch", "--skip-column-names"];
  if (database) args.push(database);
  return spawnSync("mariadb", [...args, "-e", sql], { encoding: "utf8" });
}

function ping() {
  return spawnSync("mariadb-admin", ["--no-defaults", `--socket=${db.socket}`, "--user=root", "--connect-timeout=1", "ping"], { stdio: "ignore" }).status === 0;
}

export function status() {
  const pid = readPid(db.pidFile);
  return { running: pidAlive(pid) && ping(), pid };
}

export async function start() {
  ensureDebian(["mariadbd", "mariadb-install-db", "mariadb", "mariadb-admin"], ["mariadb-server", "mariadb-client"], "MariaDB is needed");
  if (status().running) {
    console.log(`[db:${cfg.name}] already running on 127.0.0.1:${cfg.dbPort}`);
    return;
  }
  mkdirSync(cfg.dir, { recursive: true });
  const fresh = !existsSync(`${db.datadir}/mysql`);
  if (fresh) {
    console.log(`[db:${cfg.name}] initialising ${db.datadir}`);
    const r = spawnSync(
      "mariadb-install-db",
      ["--no-defaults", `--datadir=${db.datadir}`, "--user=root", "--auth-root-authentication-method=socket", "--skip-test-db"],
      { encoding: "utf8" },
    );
    if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stderr || r.stdout}`);
  }
  const args = [
    "--no-defaults",
    `--datadir=${db.datadir}`,
    `--port=${cfg.dbPort}`,
    "--bind-address=127.0.0.1",
    `--socket=${db.socket}`,
    `--pid-file=${db.pidFile}`,
    `--log-error=${db.logFile}`,
    "--skip-name-resolve",
    "--character-set-server=utf8mb4",
    "--collation-server=utf8mb4_unicode_ci",
    "--max-connections=400",
    "--innodb-buffer-pool-size=256M",
    "--innodb-flush-log-at-trx-commit=2",
  ];
  if (process.getuid?.() === 0) args.push("--user=root");
  spawnDetached("mariadbd", args, { cwd: cfg.dir });
  for (let i = 0; i < 150; i++) {
    if (ping()) break;
    await sleep(100);
    if (i === 149) throw new Error(`MariaDB did not become ready; see ${db.logFile}`);
  }
  const pw = db.password.replace(/'/g, "''");
  const setup = client(
    `CREATE DATABASE IF NOT EXISTS \`${db.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER IF NOT EXISTS '${db.user}'@'127.0.0.1' IDENTIFIED BY '${pw}';
     ALTER USER '${db.user}'@'127.0.0.1' IDENTIFIED BY '${pw}';
     GRANT ALL PRIVILEGES ON \`${db.name}\`.* TO '${db.user}'@'127.0.0.1';
     FLUSH PRIVILEGES;`,
  );
  if (setup.status !== 0) throw new Error(`could not create the database and user: ${setup.stderr}`);
  console.log(`[db:${cfg.name}] ready on 127.0.0.1:${cfg.dbPort} (database ${db.name}, user ${db.user})`);
}

export async function stop() {
  const pid = readPid(db.pidFile);
  if (!pidAlive(pid)) {
    console.log(`[db:${cfg.name}] not running`);
    return;
  }
  process.kill(pid, "SIGTERM");
  for (let i = 0; i < 300 && pidAlive(pid); i++) await sleep(100);
  if (pidAlive(pid)) throw new Error(`MariaDB (pid ${pid}) did not stop within 30 s`);
  console.log(`[db:${cfg.name}] stopped`);
}

async function reset() {
  await stop();
  rmSync(db.datadir, { recursive: true, force: true });
  console.log(`[db:${cfg.name}] data removed`);
  await start();
}

const command = process.argv[2];
const commands = { start, stop, reset, status: async () => console.log(JSON.stringify({ profile: cfg.name, port: cfg.dbPort, ...status() })) };
if (import.meta.url === `file://${process.argv[1]}`) {
  if (!commands[command]) {
    console.error("usage: node scripts/db.mjs start|stop|status|reset [--profile=dev|test]");
    process.exit(2);
  }
  commands[command]().catch((err) => {
    console.error(`[db:${cfg.name}] ${err.message}`);
    process.exit(1);
  });
}
