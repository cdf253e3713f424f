// Shared steps of npm start and npm test.
import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { root } from "./config.mjs";
import { run } from "./proc.mjs";

const bin = (name) => path.join(root, "node_modules", ".bin", name);

/** npm ci when node_modules is missing or older than the lockfile. */
export function ensureDependencies() {
  const marker = path.join(root, "node_modules", ".package-lock.json");
  const lock = path.join(root, "package-lock.json");
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log("[setup] installing npm dependencies …");
  run("npm", ["ci", "--no-audit", "--no-fund"], { cwd: root });
}

export function node(script, args = [], env = {}) {
  run(process.execPath, [path.join(root, script), ...args], { cwd: root, env: { ...process.env, ...env } });
}

/** Runs a TypeScript script with tsx; react-server condition so that `server-only` modules load. */
export function tsx(script, args = [], env = {}) {
  run(bin("tsx"), ["--conditions=react-server", path.join(root, script), ...args], { cwd: root, env: { ...process.env, ...env } });
}

export function contentBuild() {
  run(bin("tsx"), ["--conditions=react-server", path.join(root, "scripts/content-build.ts")], { cwd: root });
}

function hashTree(h, dir) {
  if (!existsSync(dir)) return;
  for (const entry of readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
    if (entry.name === "node_modules" || entry.name.startsWith(".next")) continue;
    const p = path.join(dir, entry.name);
    if (entry.isDirectory()) hashTree(h, p);
    else {
      h.update(p);
      h.update(readFileSync(p));
    }
  }
}

function sourceHash() {
  const h = createHash("sha256");
  for (const d of ["app", "components", "content", "lib", "db/schema", "public", "sw"]) hashTree(h, path.join(root, d));
  for (const f of ["next.config.mjs", "tailwind.config.ts", "mdx-components.tsx", "package-lock.json", "proxy.ts", "postcss.config.mjs", "instrumentation.ts", "mdx.d.ts", "tsconfig.json"]) {
    if (existsSync(path.join(root, f))) h.update(readFileSync(path.join(root, f)));
  }
  return h.digest("hex");
}

/**
 * A profile that builds into its own folder (".next-test-a", …) type-checks with its own small
 * tsconfig that adds that folder's generated route types, so that parallel builds never rewrite
 * the committed tsconfig.json. Returns the file name Next should use.
 */
function tsconfigFor(distDir) {
  if (distDir === ".next") return "tsconfig.json";
  const file = `tsconfig.${distDir.replace(/^\./, "")}.json`;
  const base = JSON.parse(readFileSync(path.join(root, "tsconfig.json"), "utf8"));
  const include = [...base.include.filter((p) => !p.startsWith(".next/")), `${distDir}/types/**/*.ts`, `${distDir}/dev/types/**/*.ts`];
  writeFileSync(path.join(root, file), `${JSON.stringify({ extends: "./tsconfig.json", include }, null, 2)}\n`);
  return file;
}

/**
 * next build, skipped when nothing it depends on changed since the last successful build.
 * Type errors fail the build; `typesChecked` skips Next's own pass only when the caller has just
 * run `tsc --noEmit` on the same sources (npm test does, so it does not type-check twice).
 */
export function buildApp({ force = false, distDir = ".next", env = process.env, typesChecked = false } = {}) {
  contentBuild();
  const stamp = path.join(root, distDir, "riser-source-hash");
  const hash = sourceHash();
  if (!force && existsSync(stamp) && readFileSync(stamp, "utf8") === hash && existsSync(path.join(root, distDir, "BUILD_ID"))) {
    console.log("[build] sources unchanged since the last build: reusing it");
    return;
  }
  const buildEnv = {
    ...env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_DIST_DIR: distDir,
    NEXT_TSCONFIG_PATH: tsconfigFor(distDir),
    RISER_TYPES_CHECKED: typesChecked ? "1" : "",
  };
  run(bin("next"), ["build"], { cwd: root, env: buildEnv });
  // The service worker is built from what next build wrote (scripts/build-sw.mjs).
  run(process.execPath, [path.join(root, "scripts/build-sw.mjs"), distDir], { cwd: root, env: buildEnv });
  writeFileSync(stamp, hash);
}
