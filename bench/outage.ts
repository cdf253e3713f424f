// npm run bench -- outage: what ten signed-in clients get, second by second, while the database is
// stopped for 10 s under load. Each client loads /learn (a server-rendered page) and GET
// /api/progress (a route handler) in turn; the table counts the answers per second by status, and
// the first answers of each 5xx kind are printed. Recovery: the first second after the database is
// back from which no answer is a 5xx. Not part of the default run (it stops the database).
// Writes bench/results/outage.json. The correctness side (only 503s, recovery bound) is in
// tests/faults/outage-under-load.test.ts; the counts live here because they depend on the machine.
import { pool } from "@/db/client";
import { clientOf, createOrganization, createPeople } from "../tests/helpers/fixtures";
import { perSecond, startLoad } from "../tests/helpers/load";
import { service } from "../tests/helpers/services";
import { APP, record } from "./lib";

const CLIENTS = Number(process.env.OUTAGE_CLIENTS ?? 10);
const OUTAGE_S = Number(process.env.OUTAGE_SECONDS ?? 10);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

const org = await createOrganization(`Outage Bench Co ${Date.now()}`);
const people = await createPeople(CLIENTS, { organizationId: org.id, tag: "outage-bench" });
const clients = await Promise.all(people.map((p) => clientOf(p.id)));
await pool.end();

const paths = ["/learn", "/api/progress"];
for (const p of paths) {
  const res = await clients[0]!.fetch(p);
  await res.arrayBuffer();
  if (res.status !== 200) throw new Error(`${p}: ${res.status} before the outage`);
}

const t0 = Date.now();
const load = startLoad(clients, paths);
await sleep(5_000);
const stopAt = Date.now();
await service("db", "stop");
const stoppedAt = Date.now();
await sleep(OUTAGE_S * 1000);
await service("db", "start");
const backAt = Date.now();
await sleep(10_000);
const hits = await load.stop();

const table = perSecond(hits, t0);
const fives = hits.filter((h) => h.status >= 500 && h.status !== 503);
const after = hits.filter((h) => h.at >= backAt);
const lastBad = after.filter((h) => h.status === 0 || h.status >= 500).at(-1);
const recoveredMs = lastBad ? lastBad.at - backAt : 0;
const samples = [...new Map(hits.filter((h) => h.status >= 500 || h.status === 0).reverse().map((h) => [`${h.status} ${h.path}`, h])).values()].reverse();

console.log(`app ${APP}, ${CLIENTS} clients; database stop requested at ${((stopAt - t0) / 1000).toFixed(1)} s, down at ${((stoppedAt - t0) / 1000).toFixed(1)} s, back at ${((backAt - t0) / 1000).toFixed(1)} s`);
console.table(table);
for (const h of samples) console.log(`${h.status} ${h.path}: ${(h.body ?? h.error ?? "").replace(/\s+/g, " ").slice(0, 200)}`);
record("outage", {
  clients: CLIENTS,
  outageSeconds: OUTAGE_S,
  stopRequestedAtS: +((stopAt - t0) / 1000).toFixed(1),
  stoppedAtS: +((stoppedAt - t0) / 1000).toFixed(1),
  backAtS: +((backAt - t0) / 1000).toFixed(1),
  total: hits.length,
  status500: fives.length,
  status503: hits.filter((h) => h.status === 503).length,
  noAnswer: hits.filter((h) => h.status === 0).length,
  lastFailureAfterBackMs: recoveredMs,
  perSecond: table,
  firstOfEachKind: samples.map((h) => ({ status: h.status, path: h.path, atS: +((h.at - t0) / 1000).toFixed(1), answer: (h.body ?? h.error ?? "").replace(/\s+/g, " ").slice(0, 200) })),
});
process.exit(0);
