// Builds the service worker after `next build`: esbuild bundles sw/riser-sw.ts (Serwist and
// lib/offline/names.ts), then Serwist's injectManifest writes the precache list of the build's static
// files (scripts, styles, fonts under /_next/static) and the /offline page into it.
// Output: <distDir>/riser-sw/sw.js, served at /sw.js by app/sw.js/route.ts. Next itself (Turbopack)
// builds every page exactly as before; this only reads what it wrote.
//   node scripts/build-sw.mjs [distDir]     (default: $NEXT_DIST_DIR or .next)
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { injectManifest } from "@serwist/build";
import { build } from "esbuild";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

export async function buildServiceWorker(distDir = process.env.NEXT_DIST_DIR || ".next") {
  const dist = path.resolve(root, distDir);
  const buildId = readFileSync(path.join(dist, "BUILD_ID"), "utf8").trim();
  const outDir = path.join(dist, "riser-sw");
  mkdirSync(outDir, { recursive: true });
  const bundled = path.join(outDir, "sw.bundle.js");
  await build({
    entryPoints: [path.join(root, "sw/riser-sw.ts")],
    outfile: bundled,
    bundle: true,
    format: "iife",
    target: "es2020",
    minify: true,
    legalComments: "none",
    define: { "process.env.NODE_ENV": '"production"' },
    logLevel: "warning",
  });
  const icons = path.join(root, "public/icons");
  const iconEntries = existsSync(icons)
    ? ["riser-192.png", "riser-512.png"].map((f) => ({ url: `/icons/${f}`, revision: createHash("sha256").update(readFileSync(path.join(icons, f))).digest("hex").slice(0, 16) }))
    : [];
  const result = await injectManifest({
    swSrc: bundled,
    swDest: path.join(outDir, "sw.js"),
    globDirectory: path.join(dist, "static"),
    globPatterns: ["**/*.{js,css,woff2,woff,ttf}"],
    modifyURLPrefix: { "": "/_next/static/" },
    // File names under /_next/static carry their own content hash.
    dontCacheBustURLsMatching: /./,
    // the offline page under its own address (lib/offline/names.ts OFFLINE_SHELL), so that /offline
    // itself still comes from the network in the reader's language while there is one
    additionalPrecacheEntries: [{ url: "/offline?shell=1", revision: buildId }, ...iconEntries],
  });
  for (const w of result.warnings) console.warn(`[sw] ${w}`);
  console.log(`[sw] service worker: ${result.count} files precached (${Math.round(result.size / 1024)} KiB)`);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  await buildServiceWorker(process.argv[2]);
}
