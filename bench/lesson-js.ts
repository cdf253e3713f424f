// First-load JavaScript of a lesson page: the script files the HTML references, with their sizes
// as served (uncompressed and gzip). Scripts marked `nomodule` (the legacy polyfills) are listed
// apart: browsers that run modules — every browser Riser supports — never download them.
// Beside them, in the same build, the floors a lesson page cannot go below: the scripts every page
// loads (React, React DOM, Next's router and the root layout), the scripts every signed-in page
// loads (the app shell), and the smallest page measured.
import { gzipSync } from "node:zlib";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, record, sessionCookie } from "./lib";

const [learner] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("learner").email));
const cookie = await sessionCookie(learner!.id);
const lessons = ["/modules/hydraulics-and-permits/flow-pressure-and-k-factor", "/modules/freeze-protection/where-homes-freeze"];
// floor pages: public (home, certificate look-up) and signed in (the calculators' index, the glossary)
const publicPages = ["/", "/verify"];
const signedInFloor = ["/tools", "/glossary"];

const gz = new Map<string, { raw: number; gz: number }>();
async function sizeOf(src: string) {
  let s = gz.get(src);
  if (!s) {
    const buf = Buffer.from(await (await fetch(new URL(src, APP))).arrayBuffer());
    gz.set(src, (s = { raw: buf.length, gz: gzipSync(buf).length }));
  }
  return s;
}
async function scriptsOf(p: string, signedIn: boolean) {
  const r = await fetch(`${APP}${p}`, { headers: signedIn ? { cookie } : {}, redirect: "manual" });
  if (r.status !== 200) throw new Error(`${p}: ${r.status}`);
  const html = await r.text();
  const tags = [...html.matchAll(/<script[^>]+src="([^"]+)"[^>]*>/g)];
  return {
    html,
    srcs: [...new Set(tags.filter((m) => !/nomodule/i.test(m[0])).map((m) => m[1]!))],
    legacy: [...new Set(tags.filter((m) => /nomodule/i.test(m[0])).map((m) => m[1]!))],
  };
}
async function total(srcs: string[]) {
  let raw = 0;
  let g = 0;
  for (const s of srcs) {
    const z = await sizeOf(s);
    raw += z.raw;
    g += z.gz;
  }
  return { scripts: srcs.length, kB: +(raw / 1024).toFixed(1), gzipKB: +(g / 1024).toFixed(1) };
}

const out: Record<string, unknown> = {};
const seen: Record<string, string[]> = {};
for (const p of lessons) {
  const { html, srcs, legacy } = await scriptsOf(p, true);
  seen[p] = srcs;
  out[p] = { ...(await total(srcs)), htmlKB: +(Buffer.byteLength(html) / 1024).toFixed(1), nomoduleGzipKB: (await total(legacy)).gzipKB };
}
const floorPages: Record<string, { scripts: number; kB: number; gzipKB: number }> = {};
for (const p of [...publicPages, ...signedInFloor]) {
  const { srcs } = await scriptsOf(p, signedInFloor.includes(p));
  seen[p] = srcs;
  floorPages[p] = await total(srcs);
}
const common = (pages: string[]) => pages.map((p) => seen[p]!).reduce((a, b) => a.filter((s) => b.includes(s)));
const smallest = Object.entries(floorPages).sort((a, b) => a[1].gzipKB - b[1].gzipKB)[0]!;
await pool.end();
record("lesson-js", {
  pages: out,
  floors: {
    everyPage: { what: "scripts every measured page loads (framework and root layout)", ...(await total(common(Object.keys(seen)))) },
    signedInShell: { what: "scripts every signed-in page measured loads (framework, root layout, app shell)", ...(await total(common([...lessons, ...signedInFloor]))) },
    smallestPage: { page: smallest[0], ...smallest[1] },
    pages: floorPages,
  },
});
