// Outages under load: ten signed-in clients keep loading /learn (a server-rendered page) and
// GET /api/progress (a route handler) while the database, then the object store, then the mail
// server is stopped. The requirement being checked (README "What to watch"; RFC 9110 §15.6.4: 503
// means "temporarily unable to handle the request", 500 an unexpected condition): an outage only
// ever gives 503 with a clear message, never a 500, a sign-in redirect or a dropped connection —
// also for requests already in flight when the service went away; nothing is half-written; every
// request sent 5 s after the service is back succeeds. No timings are asserted beyond that bound.
import { eq } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, mailOutbox, signOff } from "@/db/schema";
import { listObjects } from "@/lib/storage";
import { APP, fetchFrom, freshIp, waitForMail, type Client } from "../helpers/http";
import { startLoad, type Hit } from "../helpers/load";
import { service } from "../helpers/services";
import { clientOf, completedWithCertificate, createOrganization, createPeople, daysFromNow } from "../helpers/fixtures";

const CLIENTS = 10;
const PATHS = ["/learn", "/api/progress"];
/** The recovery bound: every request sent this long after the service is back must succeed. */
const RECOVERY_MS = 5_000;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

let clients: Client[] = [];
let uploader: { id: string; client: Client };
let certificateId: number;
let evidencePath: string;
let storedSignOffId: string;
let mailTo: string;

async function pdf(): Promise<Blob> {
  const doc = await PDFDocument.create();
  doc.addPage([200, 200]);
  return new Blob([Buffer.from(await doc.save())], { type: "application/pdf" });
}
async function uploadEvidence(client: Client, skill: string) {
  const form = new FormData();
  form.set("module", "pipe-and-joining");
  form.set("skill", skill);
  form.append("files", await pdf(), "joint-record.pdf");
  const res = await client.fetch("/api/sign-offs", { method: "POST", body: form });
  const text = await res.text();
  return { status: res.status, text, json: (() => { try { return JSON.parse(text) as Record<string, unknown>; } catch { return {}; } })() };
}
async function objectsOf(userId: string): Promise<string[]> {
  const keys: string[] = [];
  for await (const page of listObjects(`sign-offs/${userId}/`)) keys.push(...page.map((o) => o.key));
  return keys.sort();
}
const ready = async () => {
  const res = await fetch(`${APP}/api/health/ready`, { headers: { authorization: `Bearer ${process.env.METRICS_SECRET}` } });
  return { status: res.status, body: (await res.json()) as { status: string; database: { ok: boolean }; objectStore: { ok: boolean; error?: string } } };
};

/** Every answer is a success or the outage answer: 503, a clear message, no stack trace. */
function expectOnlyOutageAnswers(hits: Hit[], message: RegExp) {
  const wrong = hits.filter((h) => h.status !== 200 && h.status !== 503);
  expect(wrong, "answers other than 200 and 503").toEqual([]);
  for (const h of hits.filter((x) => x.status === 503)) {
    if (h.path.startsWith("/api/")) expect(JSON.parse(h.body!).error, h.path).toMatch(message);
    else expect(h.body, h.path).toContain("Riser is briefly unavailable");
    expect(h.body).not.toMatch(/at .*\.js:\d+|ECONNREFUSED|Failed query/);
  }
}
/** Requests sent RECOVERY_MS after `backAt` all succeeded (and there were some). */
function expectRecoveredBy(hits: Hit[], backAt: number) {
  const late = hits.filter((h) => h.sentAt >= backAt + RECOVERY_MS);
  expect(late.length).toBeGreaterThan(CLIENTS);
  expect(late.filter((h) => h.status !== 200)).toEqual([]);
}

beforeAll(async () => {
  const org = await createOrganization("Outage Load Fire Co");
  const people = await createPeople(CLIENTS + 1, { organizationId: org.id, tag: "outage-load" });
  clients = await Promise.all(people.slice(0, CLIENTS).map((p) => clientOf(p.id)));
  const u = people[CLIENTS]!;
  uploader = { id: u.id, client: await clientOf(u.id) };
  await completedWithCertificate({ ...u, organizationId: org.id, teamId: org.teamId }, "pipe-and-joining", { completedAt: daysFromNow(-3), expiresAt: daysFromNow(700) });
  certificateId = (await db.select({ id: certificate.id }).from(certificate).where(eq(certificate.userId, u.id)))[0]!.id;
  // evidence stored while everything runs, to be downloaded during the object-store outage
  const stored = await uploadEvidence(uploader.client, "pj-support-and-restrain");
  expect(stored.status, stored.text).toBe(201);
  const ev = (stored.json.evidence as { id: string }[])[0]!;
  storedSignOffId = stored.json.id as string;
  evidencePath = `/api/sign-offs/${storedSignOffId}/evidence/${ev.id}`;
  mailTo = people[0]!.email;
  for (const p of PATHS) expect((await clients[0]!.fetch(p)).status, p).toBe(200);
});

// The database outage runs last: the other two read the database from this process, whose pool
// would otherwise hold connections the stopped server has closed.
afterAll(async () => {
  await service("db", "start");
  await service("s3-fake", "start");
  await service("mail-catcher", "start");
  await pool.end();
}, 120_000);

describe("outages under load", () => {
  it("object store stopped under load: pages keep working; an upload answers 503 and leaves nothing behind, a download 503; the certificate PDF (made from database rows) still downloads", async () => {
    const load = startLoad(clients, PATHS);
    await service("s3-fake", "stop");
    const r = await ready();
    expect(r.status).toBe(503);
    expect(r.body.objectStore.ok).toBe(false);
    expect(r.body.database.ok).toBe(true);

    const up = await uploadEvidence(uploader.client, "pj-cpvc-joint-and-cure");
    expect(up.status, up.text).toBe(503);
    expect(up.json.error).toMatch(/file store is not reachable.*Nothing was saved/);
    const down = await uploader.client.fetch(evidencePath);
    expect(down.status).toBe(503);
    expect(((await down.json()) as { error: string }).error).toMatch(/file store is not reachable/);
    const cert = await uploader.client.fetch(`/api/certificates/${certificateId}/pdf`);
    expect(cert.status).toBe(200);
    expect(Buffer.from(await cert.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");

    await service("s3-fake", "start");
    const backAt = Date.now();
    await sleep(RECOVERY_MS + 1_000);
    const hits = await load.stop();
    expect(hits.filter((h) => h.status !== 200)).toEqual([]); // the pages never needed the store
    expectRecoveredBy(hits, backAt);

    // nothing half-written: no sign-off row and no stored file from the refused upload
    const rows = await db.select({ skill: signOff.skillId }).from(signOff).where(eq(signOff.userId, uploader.id));
    expect(rows.map((x) => x.skill)).toEqual(["pj-support-and-restrain"]);
    const keys = await objectsOf(uploader.id);
    expect(keys.length).toBeGreaterThan(0);
    expect(keys.filter((k) => !k.startsWith(`sign-offs/${uploader.id}/${storedSignOffId}/`))).toEqual([]);
    // and the same upload goes through now (a half-written one would block it as "already submitted")
    const again = await uploadEvidence(uploader.client, "pj-cpvc-joint-and-cure");
    expect(again.status, again.text).toBe(201);
    expect((await uploader.client.fetch(evidencePath)).status).toBe(200);
  });

  it("mail server stopped under load: pages keep working, the request that sends mail answers, the message waits in the outbox and goes out once mail is back", async () => {
    const load = startLoad(clients, PATHS);
    await service("mail-catcher", "stop");
    const asked = await fetchFrom(freshIp(), `${APP}/api/auth/request-password-reset`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP },
      body: JSON.stringify({ email: mailTo, redirectTo: "/reset-password" }),
    });
    expect(asked.status, await asked.clone().text()).toBe(200);
    const row = async () => (await db.select().from(mailOutbox).where(eq(mailOutbox.to, mailTo)))[0];
    // the worker tried, the connection was refused, and the message stays queued for a retry
    const until = Date.now() + 20_000;
    while (Date.now() < until && !((await row())?.tries ?? 0)) await sleep(250);
    const tried = (await row())!;
    expect(tried).toMatchObject({ kind: "password-reset", status: "pending" });
    expect(tried.tries).toBeGreaterThanOrEqual(1);
    expect(tried.lastError).toBeTruthy();
    expect((await ready()).status).toBe(200); // a mail outage does not take the server out (README "What to watch")

    await service("mail-catcher", "start");
    const backAt = Date.now();
    const mail = await waitForMail(mailTo, /reset/i, 30_000);
    expect(mail.text).toMatch(/reset the password/);
    // the row is marked sent just after the message is handed over
    for (let i = 0; i < 40 && (await row())!.status !== "sent"; i++) await sleep(250);
    expect((await row())!.status).toBe("sent");
    const remaining = RECOVERY_MS + 500 - (Date.now() - backAt);
    if (remaining > 0) await sleep(remaining);
    const hits = await load.stop();
    expect(hits.filter((h) => h.status !== 200)).toEqual([]);
  });

  it("database stopped under load: 503s with a clear message (pages and JSON, also for requests in flight), recovered within 5 s", async () => {
    const load = startLoad(clients, PATHS);
    await sleep(1_500);
    await service("db", "stop");
    await sleep(1_200); // the proxy remembers its probe for 1 s
    const r = await ready();
    expect(r.status).toBe(503);
    expect(r.body.database.ok).toBe(false);
    await sleep(2_500);
    await service("db", "start");
    const backAt = Date.now();
    await sleep(RECOVERY_MS + 2_000);
    const hits = await load.stop();

    expect(hits.filter((h) => h.status === 503).length, "the outage was seen under load").toBeGreaterThan(CLIENTS);
    expectOnlyOutageAnswers(hits, /database is not reachable/);
    expectRecoveredBy(hits, backAt);
  });
});
