// Quiz answers and submit under 50 concurrent learners against the production server: first each
// learner saves an answer to every question of their own open attempt (one PUT per attempt), then
// each request is the first submit of its own attempt, so every one is a real grading transaction.
// Afterwards the database is checked: every attempt graded exactly once, none lost.
// Beside them, the floor in the same run: the same 50 workers sending the same number of requests
// to /api/health, the smallest round trip the server answers (no session, one `SELECT 1`).
import { performance } from "node:perf_hooks";
import { pool } from "@/db/client";
import { TEST_PASSWORD, createOrganization, createPeople } from "../tests/helpers/fixtures";
import { APP, Jar, record, sessionCookie, summary, withServerCpu } from "./lib";

const N = Number(process.env.BENCH_ATTEMPTS ?? 1000);
void TEST_PASSWORD;
const org = await createOrganization(`Bench Org ${Date.now()}`, 5000);
const people = await createPeople(N, { organizationId: org.id, teamId: org.teamId, tag: "bench" });
const jars: Jar[] = [];
for (const p of people) jars.push(await Jar.signedIn(await sessionCookie(p.id)));

type Q = { position: number; type: string; options?: { id: string }[] };
const attemptIds: string[] = [];
const answersOf: { position: number; answer: unknown }[][] = [];
const answerFor = (q: Q) => (q.type === "single" ? q.options![0]!.id : q.type === "multiple" ? [q.options![0]!.id] : q.type === "truefalse" ? true : 1);
for (let i = 0; i < N; i += 25) {
  const batch = await Promise.all(
    jars.slice(i, i + 25).map(async (jar) => {
      const r = await fetch(`${APP}/api/quiz/attempts`, { method: "POST", headers: { cookie: jar.header, origin: APP, "content-type": "application/json" }, body: JSON.stringify({ module: "hydraulics-and-permits" }) });
      jar.update(r);
      if (r.status !== 201) throw new Error(`start failed: ${r.status} ${await r.text()}`);
      const view = (await r.json()) as { id: string; questions: Q[] };
      return { id: view.id, answers: view.questions.map((q) => ({ position: q.position, answer: answerFor(q) })) };
    }),
  );
  attemptIds.push(...batch.map((b) => b.id));
  answersOf.push(...batch.map((b) => b.answers));
}

/** 50 workers, each taking the next attempt until all are done. */
async function fifty(send: (i: number) => Promise<Response>) {
  let next = 0;
  const latencies: number[] = [];
  let non2xx = 0;
  const t0 = performance.now();
  await Promise.all(
    Array.from({ length: 50 }, async () => {
      for (let i = next++; i < N; i = next++) {
        const s = performance.now();
        const r = jars[i]!.update(await send(i));
        await r.arrayBuffer();
        latencies.push(performance.now() - s);
        if (r.status !== 200) non2xx++;
      }
    }),
  );
  const seconds = (performance.now() - t0) / 1000;
  return { latencyMs: summary(latencies), throughputPerSec: +(N / seconds).toFixed(1), non2xx };
}

const floor = await withServerCpu(N, () => fifty(() => fetch(`${APP}/api/health`)));

const save = await withServerCpu(N, () => fifty((i) =>
  fetch(`${APP}/api/quiz/attempts/${attemptIds[i]}/answers`, { method: "PUT", headers: { cookie: jars[i]!.header, origin: APP, "content-type": "application/json" }, body: JSON.stringify({ answers: answersOf[i] }) }),
));

const submit = await withServerCpu(N, () => fifty((i) => fetch(`${APP}/api/quiz/attempts/${attemptIds[i]}/submit`, { method: "POST", headers: { cookie: jars[i]!.header, origin: APP } })));

// exactly once: every attempt graded, each item marked, nothing left open
const [[check]] = (await pool.query(
  `SELECT SUM(status = 'graded') AS graded, SUM(status <> 'graded') AS open, (SELECT COUNT(*) FROM quiz_attempt_item i WHERE i.attempt_id IN (?) AND i.correct IS NULL) AS unmarked FROM quiz_attempt WHERE id IN (?)`,
  [attemptIds, attemptIds],
)) as unknown as [{ graded: number; open: number; unmarked: number }[]];
await pool.end();
record("quiz-submit", {
  attempts: N,
  concurrentLearners: 50,
  ...submit,
  saveAnswers: save,
  floor: { path: "/api/health", ...floor },
  integrity: { graded: Number(check!.graded), open: Number(check!.open), unmarkedItems: Number(check!.unmarked) },
});
