// Search latency over the full corpus: 200 typical queries in-process and through /api/search,
// plus what an in-browser index would cost a phone (documents to download, index build time).
import { performance } from "node:perf_hooks";
import { readFileSync } from "node:fs";
import { pool } from "@/db/client";
import { demoByRole } from "@/db/demo";
import { loadCatalogFrom } from "@/lib/content/load";
import { buildSearchDocs } from "@/lib/search/docs";
import { SearchIndex } from "@/lib/search";
import { RELEVANCE } from "../tests/unit/search-relevance.fixture";
import { APP, record, sessionCookie, summary } from "./lib";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { user } from "@/db/schema";

const catalog = loadCatalogFrom("content");
const docs = buildSearchDocs(catalog);
const base = ["sidewall", "antifreeze", "friction loss", "k-factor", "cpvc cement", "insulate attic", "flow test", "backflow", "rough-in", "trim", "escutcheon", "hydrostatic", "meter size", "coverage area", "sloped ceiling", "painted sprinkler", "test connection", "homebuyer insurance", "pex", "copper type l"];
// Plus the job-site questions of the relevance test (typos, synonyms, sizes): the budget is an
// in-process p95 under 5 ms.
const jobSite = RELEVANCE.map(([q]) => q);
const pool2 = [...base, ...jobSite];
const queries = Array.from({ length: 400 }, (_, i) => {
  const q = pool2[i % pool2.length]!;
  return i % 3 === 0 ? q.slice(0, Math.max(3, Math.ceil(q.length / 2))) : q; // some as-you-type prefixes
});

const t0 = performance.now();
const index = new SearchIndex(docs);
const buildMs = performance.now() - t0;
for (const q of queries.slice(0, 20)) index.search(q); // warm-up
const inProcess: number[] = [];
for (const q of queries) {
  const s = performance.now();
  index.search(q);
  inProcess.push(performance.now() - s);
}

const [learner] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("learner").email));
const cookie = await sessionCookie(learner!.id);
const api: number[] = [];
for (const q of queries) {
  const s = performance.now();
  const res = await fetch(`${APP}/api/search?q=${encodeURIComponent(q)}`, { headers: { cookie } });
  await res.json();
  api.push(performance.now() - s);
}
await pool.end();

const docsBytes = Buffer.byteLength(readFileSync("lib/search/generated/docs.json"));
record("search", {
  corpus: { documents: docs.length, docsJsonBytes: docsBytes },
  inProcessMs: summary(inProcess),
  indexBuildMs: +buildMs.toFixed(1),
  apiMs: summary(api),
  note: "in-browser option = download docsJsonBytes (before gzip) and build the index on the phone (indexBuildMs measured on this server CPU; phones are slower) before the first result",
});
