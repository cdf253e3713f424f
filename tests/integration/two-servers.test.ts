// Two app servers on one MariaDB, as N instances behind a load balancer would run: this file starts a
// second server from the same production build with the same environment (tests/helpers/second-server.ts)
// and sends each piece of one person's work to both. What must hold, and the outside reference for it:
//  - a session made on one server is a session on the other, and a sign-out on one ends it on both
//    (on the other within the signed session copy's bound, README "Security model");
//  - a lesson's first-open stamp (the seat-time rule's start) written by one server is the one the
//    other counts from (each server only remembers which stamps it wrote, as a hint);
//  - the per-address sign-in limit and the per-account pause are one count across servers
//    (NIST SP 800-63B §5.2.2: limit failed attempts on the account, wherever they come from), and a
//    TOTP code accepted by one server is refused by the other (RFC 6238 §5.2);
//  - the same quiz attempt submitted to both at once is graded once and gives one certificate, and
//    serials stay gapless (each reserved number belongs to exactly one certificate);
//  - a certificate issued through one server verifies through the other: page, /api/verify, the
//    Open Badges credential and its JWT (signed with the key the other server publishes), and a
//    revocation made on one is seen at once on the other;
//  - scheduled jobs started on both at once do each piece of work once (one certificate, one mail);
//    tests/integration/jobs.test.ts shows their runs never overlap (server and cron process).
import { and, eq, gt, inArray, sql } from "drizzle-orm";
import { createLocalJWKSet, jwtVerify, type JWK } from "jose";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, certificateSerialCounter, jobRun, lessonOpen, moduleCompletion, quizAttempt } from "@/db/schema";
import { DEMO_PASSWORD, demoByRole } from "@/db/demo";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { APP, cookiesOf, freshIp, mailsTo, postJson, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { backdateOpens, clientOf, completion, createPeople, createPerson, createTestOrganization, gradedAttempt, lessonsDone } from "../helpers/fixtures";
import { answersFor, catalog } from "../helpers/quiz";
import { demoAdminCode } from "../helpers/totp";
import { passwordSignIn, startSecondServer, via, type SecondServer } from "../helpers/second-server";

let second: SecondServer;
let A: string;
let B: string;
let org: { id: string; teamId: string };

beforeAll(async () => {
  second = await startSecondServer();
  A = APP;
  B = second.url;
  org = await createTestOrganization("Two Servers Sprinkler Co");
}, 150_000);

afterAll(async () => {
  await second?.stop();
  await pool.end();
});

const year = () => new Date().getUTCFullYear();
const counter = async () => (await db.select().from(certificateSerialCounter).where(eq(certificateSerialCounter.year, year())))[0]?.lastNumber ?? 0;

/** Every serial number reserved after `before` belongs to exactly one certificate, with no gap and no repeat. */
async function expectGapless(before: number) {
  const after = await counter();
  const rows = await db
    .select({ n: certificate.serialNumber })
    .from(certificate)
    .where(and(eq(certificate.serialYear, year()), gt(certificate.serialNumber, before)));
  expect(rows.map((r) => r.n).sort((x, y) => x - y)).toEqual(Array.from({ length: after - before }, (_, i) => before + i + 1));
  return after - before;
}

const moduleCertsOf = (userIds: string[]) => db.select().from(certificate).where(and(inArray(certificate.userId, userIds), eq(certificate.kind, "module")));

async function session(base: string, client: Pick<Client, "cookie" | "ip">) {
  const res = await via(base, client).fetch("/api/auth/get-session");
  expect(res.status).toBe(200);
  return (await res.json()) as { user?: { email: string } } | null;
}

describe("sessions", () => {
  it("made on one server work on the other, and a sign-out on either ends them on both", async () => {
    const p = await createPerson({ tag: "two-srv-session", organizationId: org.id });
    const ip = freshIp();
    const res = await passwordSignIn(B, p.email, p.password, ip);
    expect(res.status).toBe(200);
    const me = { cookie: cookiesOf(res), ip };
    expect((await session(A, me))?.user?.email).toBe(p.email);
    expect((await session(B, me))?.user?.email).toBe(p.email);
    // a signed-in page and an API route on the server that did not make the session
    expect((await via(A, me).fetch("/learn")).status).toBe(200);
    expect((await via(A, me).fetch("/api/quiz/attempts")).status).toBe(200);
    expect((await via(A, { cookie: "", ip }).fetch("/api/quiz/attempts")).status).toBe(401);

    const out = await via(A, me).fetch("/api/auth/sign-out", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(out.status).toBe(200);
    // B may trust its signed session copy until that copy's age runs out (README "Security model":
    // 60 s; SESSION_CACHE_MAX_AGE_S on the test profile), never longer
    const bound = Number(process.env.SESSION_CACHE_MAX_AGE_S ?? 60) * 1000 + 2000;
    const from = Date.now();
    while ((await session(B, me)) !== null && Date.now() - from < bound) await new Promise((r) => setTimeout(r, 250));
    expect(await session(B, me)).toBeNull();
    expect((await via(B, me).fetch("/api/quiz/attempts")).status).toBe(401);
  });
});

describe("reading time", () => {
  it("a lesson first opened on one server keeps that stamp on the other and counts there", async () => {
    const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag: "two-srv-read" });
    const c = await clientOf(p!.id);
    const mod = catalog.modules.find((m) => m.slug === "pipe-and-joining")!;
    const lesson = mod.lessons[0]!.slug;
    const stamp = async () => (await db.select({ at: lessonOpen.firstOpenedAt }).from(lessonOpen).where(eq(lessonOpen.userId, p!.id)))[0]?.at;
    // opened on A; marked done on B at once: too soon, counted from the stamp A wrote
    expect((await via(A, c).fetch(`/modules/${mod.slug}/${lesson}`)).status).toBe(200);
    const first = await stamp();
    expect(first).toBeInstanceOf(Date);
    const soon = await postJson(via(B, c), "/api/progress", { module: mod.slug, lesson });
    expect(soon.status).toBe(409);
    expect(soon.text).toContain("Keep reading"); // B found A's stamp (no stamp answers "Open the lesson")
    await new Promise((r) => setTimeout(r, 1100));
    expect((await via(B, c).fetch(`/modules/${mod.slug}/${lesson}`)).status).toBe(200);
    expect((await stamp())!.getTime()).toBe(first!.getTime()); // the first open stays the first
    await backdateOpens(p!.id, mod.slug);
    expect((await postJson(via(B, c), "/api/progress", { module: mod.slug, lesson })).status).toBe(200);
  });
});

/** The per-address sign-in counter uses fixed windows (lib/auth/throttle.ts): start a burst well inside one. */
async function awayFromWindowEdge(seconds = 15) {
  const windowS = Number(process.env.AUTH_RATE_LIMIT_WINDOW_S ?? 60);
  const into = (Date.now() / 1000) % windowS;
  if (into > windowS - seconds) await new Promise((r) => setTimeout(r, (windowS - into + 1) * 1000));
}

describe("limits shared by both servers", () => {
  it("the per-address sign-in limit counts requests to either server", async () => {
    const ip = freshIp();
    const max = Number(process.env.AUTH_RATE_LIMIT_MAX);
    expect(max).toBeGreaterThan(1);
    await awayFromWindowEdge();
    const statuses: number[] = [];
    for (let i = 0; i < max; i++) statuses.push((await passwordSignIn(i % 2 ? B : A, uniqueEmail("nobody"), "not-the-password-1", ip)).status);
    expect(statuses).toEqual(Array(max).fill(401));
    // one server alone has seen only half of them: the next one is refused on both all the same
    expect((await passwordSignIn(B, uniqueEmail("nobody"), "not-the-password-1", ip)).status).toBe(429);
    expect((await passwordSignIn(A, uniqueEmail("nobody"), "not-the-password-1", ip)).status).toBe(429);
  });

  it("the same at once: no more sign-in tries get through than the limit, whichever server answers", async () => {
    const ip = freshIp();
    const max = Number(process.env.AUTH_RATE_LIMIT_MAX);
    await awayFromWindowEdge();
    const statuses = await Promise.all(Array.from({ length: 2 * max }, (_, i) => passwordSignIn(i % 2 ? B : A, uniqueEmail("nobody"), "not-the-password-1", ip).then((r) => r.status)));
    expect(statuses.filter((s) => s !== 429).length).toBeLessThanOrEqual(max);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(max);
  });

  it("a per-account pause reached through both servers at once holds on both, and is mailed once", async () => {
    const p = await createPerson({ tag: "two-srv-lock" });
    const failures = 10; // SIGN_IN_LOCK_FAILURES (lib/env default; the test profiles do not change it)
    // each wrong password from its own address, half to each server, all at once
    const wrong = await Promise.all(Array.from({ length: failures }, (_, i) => passwordSignIn(i % 2 ? B : A, p.email, "wrong-password-2026", freshIp()).then((r) => r.status)));
    expect(wrong).toEqual(Array(failures).fill(401));
    for (const base of [A, B]) {
      const right = await passwordSignIn(base, p.email, p.password, freshIp());
      expect(right.status).toBe(429);
      expect(((await right.json()) as { code?: string }).code).toBe("ACCOUNT_SIGN_IN_PAUSED");
    }
    await waitForMail(p.email, /Sign-in to your Riser account is paused/);
    await new Promise((r) => setTimeout(r, 1500));
    expect((await mailsTo(p.email)).filter((m) => /paused/.test(m.subject))).toHaveLength(1);
  });

  it("certificate look-ups per address count on both servers", async () => {
    const [holder] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag: "two-srv-lookup" });
    const at = new Date(Date.now() - 86_400_000);
    await completion(holder!.id, "freeze-protection", await gradedAttempt({ id: holder!.id, organizationId: org.id }, "freeze-protection", true, at), at);
    const [c] = await db.select({ id: moduleCompletion.id }).from(moduleCompletion).where(eq(moduleCompletion.userId, holder!.id));
    const [cert] = await issueCertificateForCompletion(c!.id, { notify: false });
    const ip = freshIp();
    const max = Number(process.env.VERIFY_RATE_LIMIT_MAX ?? 30); // lib/env default
    const statuses: number[] = [];
    for (let i = 0; i < max; i++) statuses.push((await via(i % 2 ? B : A, { cookie: "", ip }).fetch(`/api/verify/${cert!.verificationCode}`)).status);
    expect(statuses).toEqual(Array(max).fill(200));
    expect((await via(A, { cookie: "", ip }).fetch(`/api/verify/${cert!.verificationCode}`)).status).toBe(429);
    expect((await via(B, { cookie: "", ip }).fetch(`/api/verify/${cert!.verificationCode}`)).status).toBe(429);
  });

  it("a TOTP code accepted by one server is refused by the other, even sent to both at once", async () => {
    const admin = demoByRole("admin").email;
    const pending = async (base: string) => {
      const res = await passwordSignIn(base, admin, DEMO_PASSWORD, freshIp());
      expect(res.status).toBe(200);
      expect(((await res.json()) as { twoFactorRedirect?: boolean }).twoFactorRedirect).toBe(true);
      return cookiesOf(res);
    };
    const [onA, onB] = [await pending(A), await pending(B)];
    const verify = (base: string, cookie: string, code: string) =>
      via(base, { cookie, ip: freshIp() }).fetch("/api/auth/two-factor/verify-totp", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ code }) });
    // other tests sign the demo admin in too: try the codes the app accepts now until one was unused,
    // and when all three were used, wait for the next 30-second step (as tests/helpers/totp.ts does)
    let outcome: { status: number; code?: string }[] | null = null;
    for (let round = 0; round < 3 && !outcome; round++) {
      if (round) await new Promise((r) => setTimeout(r, 30_000 - (Date.now() % 30_000) + 200));
      const step = Math.floor(Date.now() / 30_000);
      for (const s of [step, step + 1, step - 1]) {
        const code = demoAdminCode(s * 30_000 + 1_000);
        const answers = await Promise.all([verify(A, onA, code), verify(B, onB, code)]);
        const read = await Promise.all(answers.map(async (r) => ({ status: r.status, code: ((await r.json().catch(() => ({}))) as { code?: string }).code })));
        if (read.every((r) => r.code === "TOTP_CODE_ALREADY_USED")) continue;
        outcome = read;
        break;
      }
    }
    expect(outcome, "no unused code among the three the app accepts now").not.toBeNull();
    expect(outcome!.map((o) => o.status).sort()).toEqual([200, 409]);
    expect(outcome!.find((o) => o.status === 409)!.code).toBe("TOTP_CODE_ALREADY_USED");
  }, 120_000);
});

describe("quiz submitted to both servers at once", () => {
  const MODULE = "talking-with-homebuyers"; // no practical sign-off required: lessons + quiz complete it
  let issued: (typeof certificate.$inferSelect)[] = [];

  it("is graded once per attempt, completes once, issues one certificate, and serials stay gapless", async () => {
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    const people = await createPeople(4, { organizationId: org.id, teamId: org.teamId, tag: "two-srv-quiz" });
    for (const p of people) await lessonsDone(p, MODULE, mod.lessons.length);
    const clients = await Promise.all(people.map((p) => clientOf(p.id)));
    const attempts = await Promise.all(clients.map((c, i) => postJson(via(i % 2 ? B : A, c), "/api/quiz/attempts", { module: MODULE })));
    expect(attempts.map((a) => a.status)).toEqual(Array(people.length).fill(201));
    const answers = await Promise.all(attempts.map((a) => answersFor(a.json.id as string)));
    const before = await counter();

    // every attempt: three submits to each server, all attempts at once
    const submits = await Promise.all(
      clients.flatMap((c, i) => Array.from({ length: 6 }, (_, k) => postJson(via(k % 2 ? B : A, c), `/api/quiz/attempts/${attempts[i]!.json.id}/submit`, { answers: answers[i] }).then((r) => ({ i, r })))),
    );
    expect(submits.map((s) => s.r.status).filter((s) => s !== 200)).toEqual([]);
    for (let i = 0; i < people.length; i++) {
      const mine = submits.filter((s) => s.i === i);
      expect(new Set(mine.map((s) => s.r.text)).size, "every submit of one attempt gets the same answer").toBe(1);
      expect(mine[0]!.r.json).toMatchObject({ passed: true, score: 100 });
    }

    const ids = people.map((p) => p.id);
    const graded = await db.select().from(quizAttempt).where(inArray(quizAttempt.userId, ids));
    expect(graded.map((a) => a.status)).toEqual(Array(people.length).fill("graded"));
    const completions = await db.select().from(moduleCompletion).where(inArray(moduleCompletion.userId, ids));
    expect(completions.map((c) => c.userId).sort()).toEqual([...ids].sort());
    issued = await moduleCertsOf(ids);
    expect(issued.map((c) => c.userId).sort()).toEqual([...ids].sort());
    expect(issued.every((c) => c.subjectSlug === MODULE)).toBe(true);
    expect(await expectGapless(before)).toBe(people.length);
  });

  it("each certificate verifies on both servers the same way: page, /api/verify, credential and its JWT", async () => {
    expect(issued.length).toBeGreaterThan(0);
    const cert = issued[0]!;
    const visitor = (base: string) => via(base, { cookie: "", ip: freshIp() });
    const keysOf = async (base: string) => createLocalJWKSet((await (await visitor(base).fetch("/.well-known/jwks.json")).json()) as { keys: JWK[] });
    const [keysA, keysB] = [await keysOf(A), await keysOf(B)];

    const api = await Promise.all([A, B].map(async (base) => (await visitor(base).fetch(`/api/verify/${cert.verificationCode}`)).json()));
    expect(api[0]).toMatchObject({ serial: cert.serial, status: "valid" });
    expect(api[1]).toEqual(api[0]);
    for (const base of [A, B]) {
      const page = await visitor(base).fetch(`/verify/${cert.verificationCode}`);
      expect(page.status).toBe(200);
      const html = await page.text();
      expect(html).toContain("genuine and valid today");
      expect(html).toContain(cert.serial);
    }
    const creds = await Promise.all([A, B].map(async (base) => (await visitor(base).fetch(`/api/verify/${cert.verificationCode}/credential`)).json()));
    expect(creds[1]).toEqual(creds[0]);
    // the JWT one server signs verifies with the keys the other publishes
    const jwtA = await (await visitor(A).fetch(`/api/verify/${cert.verificationCode}/credential?format=jwt`)).text();
    const jwtB = await (await visitor(B).fetch(`/api/verify/${cert.verificationCode}/credential?format=jwt`)).text();
    const fromA = await jwtVerify(jwtA, keysB, { algorithms: ["EdDSA"], issuer: `${APP}/api/credentials/issuer` });
    const fromB = await jwtVerify(jwtB, keysA, { algorithms: ["EdDSA"], issuer: `${APP}/api/credentials/issuer` });
    expect(fromA.payload.jti).toBe(fromB.payload.jti);
    expect(fromA.payload.credentialSubject).toEqual(fromB.payload.credentialSubject);
  });

  it("a revocation made through one server shows at once on the other", async () => {
    const cert = issued[1]!;
    const [mgr] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, role: "manager", tag: "two-srv-mgr" });
    const manager = await clientOf(mgr!.id);
    const res = await postJson(via(A, manager), `/api/certificates/${cert.id}/revoke`, { reason: "Checked on the other server" });
    expect(res.status).toBe(200);
    const visitor = via(B, { cookie: "", ip: freshIp() });
    expect(((await (await visitor.fetch(`/api/verify/${cert.verificationCode}`)).json()) as { status: string }).status).toBe("revoked");
    expect(await (await visitor.fetch(`/verify/${cert.verificationCode}`)).text()).toContain("It is not valid");
  });
});

describe("scheduled jobs started on both servers at once", () => {
  it("issue each missing certificate once and mail each holder once", async () => {
    const people = await createPeople(3, { organizationId: org.id, teamId: org.teamId, tag: "two-srv-jobs" });
    const at = new Date(Date.now() - 3_600_000);
    for (const p of people) await completion(p.id, "pipe-and-joining", await gradedAttempt({ id: p.id, organizationId: org.id }, "pipe-and-joining", true, at), at);
    const before = await counter();
    const lastRun = (await db.select({ id: sql<number>`COALESCE(MAX(${jobRun.id}), 0)` }).from(jobRun))[0]!.id;

    const jobs = ["certificate-backfill", "mail-outbox"];
    const runOn = async (base: string) => {
      const res = await via(base, { cookie: "", ip: freshIp() }).fetch(`/api/jobs/run?${jobs.map((j) => `job=${j}`).join("&")}`, { method: "POST", headers: { "x-jobs-secret": process.env.JOBS_SECRET! } });
      expect(res.status).toBe(200);
      return ((await res.json()) as { results: { name: string; ok: boolean; skipped?: boolean }[] }).results;
    };
    const results = (await Promise.all([runOn(A), runOn(B), runOn(A), runOn(B)])).flat();
    expect(results.every((r) => r.ok)).toBe(true);

    const ids = people.map((p) => p.id);
    const certs = await moduleCertsOf(ids);
    expect(certs.map((c) => c.userId).sort()).toEqual([...ids].sort());
    await expectGapless(before);
    // one run at a time across both servers: each recorded run starts after the one before ended
    const runs = await db.select().from(jobRun).where(and(eq(jobRun.job, "certificate-backfill"), gt(jobRun.id, lastRun))).orderBy(jobRun.startedAt, jobRun.id);
    expect(runs.length + results.filter((r) => r.name === "certificate-backfill" && r.skipped).length).toBe(4);
    for (let i = 1; i < runs.length; i++) expect(runs[i]!.startedAt.getTime()).toBeGreaterThanOrEqual(runs[i - 1]!.finishedAt!.getTime());

    for (const p of people) await waitForMail(p.email, /Your Riser certificate/);
    // both servers' outbox workers poll every 2 s: give them time to send anything twice
    await new Promise((r) => setTimeout(r, 5000));
    for (const p of people) expect((await mailsTo(p.email)).filter((m) => /Your Riser certificate/.test(m.subject)), p.email).toHaveLength(1);
  });
});
