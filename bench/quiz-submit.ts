// Quiz submit under 50 concurrent learners against next start: each request is the
// first submit of its own open attempt, so every one is a real grading transaction.
import { performance } from "node:perf_hooks";
import { pool } from "@/db/client";
import { TEST_PASSWORD, createOrganization, createPeople } from "../tests/helpers/fixtures";
import { APP, record, sessionCookie, summary } from "./lib";

const N = Number(process.env.BENCH_ATTEMPTS ?? 1000);
void TEST_PASSWORD;
const org = await createOrganization(`Bench Org ${Date.now()}`, 5000);
const people = await createPeople(N, { organizationId: org.id, teamId: org.teamId, tag: "bench" });
const cookies: string[] = [];
for (const p of people) cookies.push(await sessionCookie(p.id));

const attemptIds: string[] = [];
for (let i = 0; i < N; i += 25) {
  const batch = await Promise.all(
    cookies.slice(i, i + 25).map(async (cookie) => {
      const r = await fetch(`${APP}/api/quiz/attempts`, { method: "POST", headers: { cookie, origin: APP, "content-type": "application/json" }, body: JSON.stringify({ module: "hydraulics-and-permits" }) });
      if (r.status !== 201) throw new Error(`start failed: ${r.status} ${await r.text()}`);
      return ((await r.json()) as { id: string }).id;
    }),
  );
  attemptIds.push(...batch);
}

// 50 workers, each submitting the next not-yet-submitted attempt until all are done.
let next = 0;
const latencies: number[] = [];
let non2xx = 0;
const t0 = performance.now();
await Promise.all(
  Array.from({ length: 50 }, async () => {
    for (let i = next++; i < N; i = next++) {
      const s = performance.now();
      const r = await fetch(`${APP}/api/quiz/attempts/${attemptIds[i]}/submit`, { method: "POST", headers: { cookie: cookies[i]!, origin: APP } });
      await r.arrayBuffer();
      latencies.push(performance.now() - s);
      if (r.status !== 200) non2xx++;
    }
  }),
);
const seconds = (performance.now() - t0) / 1000;
await pool.end();
record("quiz-submit", { attempts: N, concurrentLearners: 50, latencyMs: summary(latencies), throughputPerSec: +(N / seconds).toFixed(1), non2xx });
