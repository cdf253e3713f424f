#!/usr/bin/env node
// Local fake of an S3-compatible object store (development and tests only): s3rver on 127.0.0.1 at
// the profile's s3Port, data under .data/<profile>/s3, the profile's bucket created at start.
//   node scripts/s3-fake.mjs start|stop|serve [--profile=dev|test|test-a …]
// Test profiles start from an empty store, as their database is reset before each run.
import { mkdirSync, openSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import S3rver from "s3rver";
import { config } from "./lib/config.mjs";
import { pidAlive, readPid, sleep, spawnDetached } from "./lib/proc.mjs";

const cfg = config();
const dir = path.join(cfg.dir, "s3");
const pidFile = path.join(cfg.dir, "s3-fake.pid");
const logFile = path.join(cfg.dir, "s3-fake.log");
const bucket = cfg.env.S3_BUCKET;

async function serve() {
  mkdirSync(dir, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port: cfg.s3Port,
    silent: true,
    directory: dir,
    vhostBuckets: false,
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await server.run();
  const shut = async () => {
    await server.close().catch(() => {});
    rmSync(pidFile, { force: true });
    process.exit(0);
  };
  process.on("SIGTERM", shut);
  process.on("SIGINT", shut);
}

/** Up when the bucket answers a listing (s3rver accepts any signature for its default key pair). */
async function healthy() {
  try {
    const r = await fetch(`http://127.0.0.1:${cfg.s3Port}/${bucket}?list-type=2&max-keys=1`);
    return r.status === 200 || r.status === 403;
  } catch {
    return false;
  }
}

async function start() {
  if (pidAlive(readPid(pidFile)) && (await healthy())) {
    console.log(`[s3:${cfg.name}] already running`);
    return;
  }
  mkdirSync(cfg.dir, { recursive: true });
  if (cfg.name.startsWith("test")) rmSync(dir, { recursive: true, force: true });
  const child = spawnDetached(process.execPath, [new URL(import.meta.url).pathname, "serve", `--profile=${cfg.name}`], {
    stdio: ["ignore", openSync(logFile, "a"), openSync(logFile, "a")],
  });
  writeFileSync(pidFile, String(child.pid));
  for (let i = 0; i < 100; i++) {
    if (await healthy()) {
      console.log(`[s3:${cfg.name}] fake S3 at http://127.0.0.1:${cfg.s3Port}, bucket "${bucket}", data in ${path.relative(process.cwd(), dir) || dir}`);
      return;
    }
    if (!pidAlive(child.pid)) break;
    await sleep(100);
  }
  throw new Error(`the fake S3 server did not start on port ${cfg.s3Port} (is the port taken? see ${logFile})`);
}

async function stop() {
  const pid = readPid(pidFile);
  if (!pidAlive(pid)) return console.log(`[s3:${cfg.name}] not running`);
  process.kill(pid, "SIGTERM");
  for (let i = 0; i < 50 && pidAlive(pid); i++) await sleep(100);
  rmSync(pidFile, { force: true });
  console.log(`[s3:${cfg.name}] stopped`);
}

const cmd = process.argv[2];
if (cmd === "serve") await serve();
else if (cmd === "start") await start();
else if (cmd === "stop") await stop();
else {
  console.error("usage: node scripts/s3-fake.mjs start|stop|serve [--profile=dev|test]");
  process.exit(2);
}
