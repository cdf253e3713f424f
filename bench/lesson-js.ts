// First-load JavaScript of a lesson page: the script files the HTML references, with their sizes
// as served (uncompressed and gzip).
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
  const srcs = [...new Set([...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => m[1]!))];
  let raw = 0;
  let gz = 0;
  for (const s of srcs) {
    const buf = Buffer.from(await (await fetch(new URL(s, APP))).arrayBuffer());
    raw += buf.length;
    gz += gzipSync(buf).length;
  }
  out[p] = { scripts: srcs.length, kB: +(raw / 1024).toFixed(1), gzipKB: +(gz / 1024).toFixed(1), htmlKB: +(Buffer.byteLength(html) / 1024).toFixed(1) };
}
await pool.end();
record("lesson-js", { pages: out });
