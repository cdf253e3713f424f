#!/usr/bin/env node
// Local fake of an S3-compatible object store (development and tests only): s3rver on 127.0.0.1 at
// the profile's s3Port, data under .data/<profile>/s3, the profile's bucket created at start.
//   node scripts/s3-fake.mjs start|stop|serve [--profile=dev|test|test-a …] [--keep-data]
// Test profiles start from an empty store, as their database is reset before each run;
// --keep-data restarts with what was stored (fault tests: an outage loses nothing).
import { mkdirSync, rmSync } from "node:fs";
import path from "node:path";
import S3rver from "s3rver";
import { config } from "./lib/config.mjs";
import { daemon } from "./lib/daemon.mjs";

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

/**
 * Up when the bucket answers a listing (s3rver accepts any signature for its default key pair).
 * A version-1 listing: s3rver answers a truncated version-2 one (two or more keys, max-keys=1)
 * with a 500, so a store restarted with its data would never look up.
 */
async function healthy() {
  try {
    const r = await fetch(`http://127.0.0.1:${cfg.s3Port}/${bucket}?max-keys=1`);
    return r.status === 200 || r.status === 403;
  } catch {
    return false;
  }
}

const { start, stop } = daemon({
  tag: `s3:${cfg.name}`,
  dir: cfg.dir,
  pidFile,
  logFile,
  script: new URL(import.meta.url).pathname,
  profile: cfg.name,
  healthy,
  // test profiles start with an empty store, like their freshly reset database
  beforeStart: () => cfg.name.startsWith("test") && !process.argv.includes("--keep-data") && rmSync(dir, { recursive: true, force: true }),
  ready: `fake S3 at http://127.0.0.1:${cfg.s3Port}, bucket "${bucket}", data in ${path.relative(process.cwd(), dir) || dir}`,
});

const cmd = process.argv[2];
if (cmd === "serve") await serve();
else if (cmd === "start") await start();
else if (cmd === "stop") await stop();
else {
  console.error("usage: node scripts/s3-fake.mjs start|stop|serve [--profile=dev|test]");
  process.exit(2);
}
