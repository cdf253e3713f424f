// First-load JavaScript of a lesson page: the script files the HTML references, with their sizes
// as served (uncompressed and gzip). Scripts marked `nomodule` (the legacy polyfills) are listed
// apart: browsers that run modules — every browser Riser supports — never download them.
import { gzipSync } from "node:zlib";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, record, sessionCookie } from "./lib";

const [learner] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("learner").email));
const cookie = await sessionCookie(learner!.id);
const pages = ["/modules/hydraulics-and-permits/flow-pressure-and-k-factor", "/modules/freeze-protection/where-homes-freeze"];
const out: Record<string, unknown> = {};
for (const p of pages) {
  const html = await (await fetch(`${APP}${p}`, { headers: { cookie } })).text();
  const tags = [...html.matchAll(/<script[^>]+src="([^"]+)"[^>]*>/g)];
  const srcs = [...new Set(tags.filter((m) => !/nomodule/i.test(m[0])).map((m) => m[1]!))];
  const legacy = [...new Set(tags.filter((m) => /nomodule/i.test(m[0])).map((m) => m[1]!))];
  let legacyGz = 0;
  for (const s of legacy) legacyGz += gzipSync(Buffer.from(await (await fetch(new URL(s, APP))).arrayBuffer())).length;
  let raw = 0;
  let gz = 0;
  for (const s of srcs) {
    const buf = Buffer.from(await (await fetch(new URL(s, APP))).arrayBuffer());
    raw += buf.length;
    gz += gzipSync(buf).length;
  }
  out[p] = { scripts: srcs.length, kB: +(raw / 1024).toFixed(1), gzipKB: +(gz / 1024).toFixed(1), htmlKB: +(Buffer.byteLength(html) / 1024).toFixed(1), nomoduleGzipKB: +(legacyGz / 1024).toFixed(1) };
}
await pool.end();
record("lesson-js", { pages: out });
