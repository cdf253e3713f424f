// Certificates end to end against the running app and its database: issuing (idempotent, renewals,
// learning paths, 50 at once), the PDF route's access rules, public verification (fields, statuses,
// 404s, rate limit), revocation with its audit row, and the once-only expiry reminder.
// Expected hours come from the content files (content/modules/*/module.yaml), not from the code.
import { randomUUID } from "node:crypto";
import path from "node:path";
import { hashPassword } from "better-auth/crypto";
import { and, eq, inArray } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { demoByRole, DEMO_PASSWORD } from "@/db/demo";
import { account, auditLog, certificate, certificateSerialCounter, organization, user } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { issueMissingCertificates } from "@/lib/certificates/issue";
import { sendExpiryReminders } from "@/lib/certificates/reminders";
import { addMonthsUtc, parseSerial } from "@/lib/certificates/status";
import { loadCatalogFrom } from "@/lib/content/load";
import { APP, anonymous, mailsTo, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { completion, gradedAttempt } from "../helpers/fixtures";
import { pdfText, qrFromPdf } from "../helpers/pdf";

const catalog = loadCatalogFrom(path.resolve("content"));
const hoursOf = (slug: string) => catalog.modules.find((m) => m.slug === slug)!.meta.ceHours;
const validityOf = (slug: string) => catalog.modules.find((m) => m.slug === slug)!.meta.validityMonths;
const DAY = 86_400_000;
const PUBLIC_KEYS = ["ceHours", "expiresAt", "holderName", "issuedAt", "kind", "serial", "status", "title"];

let quillmoorId: string;
let larkhavenId: string;

async function person(tag: string, opts: { name?: string; org?: string | null; login?: boolean } = {}) {
  const id = randomUUID();
  const email = uniqueEmail(tag);
  await db.insert(user).values({ id, name: opts.name ?? `Cert ${tag}`, email, emailVerified: true, role: "learner", organizationId: opts.org === undefined ? quillmoorId : opts.org });
  if (opts.login) await db.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(DEMO_PASSWORD) });
  return { id, email };
}

/** A passed attempt and its completion row, as the quiz engine records them. */
async function complete(userId: string, moduleSlug: string, completedAt = new Date()): Promise<number> {
  const attemptId = await gradedAttempt({ id: userId, organizationId: quillmoorId }, moduleSlug, true, completedAt, { score: 100 });
  return completion(userId, moduleSlug, attemptId, completedAt);
}

const certsOf = (userId: string) => db.select().from(certificate).where(eq(certificate.userId, userId)).orderBy(certificate.id);

async function getPdf(client: Client, id: number) {
  const res = await client.fetch(`/api/certificates/${id}/pdf`);
  return { res, bytes: res.status === 200 ? new Uint8Array(await res.arrayBuffer()) : null };
}

let holder: { id: string; email: string };
let holderClient: Client;
let otherLearner: Client;
let manager: Client; // Quillmoor
let otherManager: Client; // Larkhaven
let admin: Client;
let firstCert: typeof certificate.$inferSelect;

beforeAll(async () => {
  const orgs = await db.select().from(organization);
  quillmoorId = orgs.find((o) => o.name === "Quillmoor Fire Protection")!.id;
  larkhavenId = orgs.find((o) => o.name === "Larkhaven Homes")!.id;
  holder = await person("holder", { name: "Zoë Ñúñez-Łukasz", login: true });
  const other = await person("other", { login: true });
  holderClient = await signIn(holder.email);
  otherLearner = await signIn(other.email);
  manager = await signIn(demoByRole("manager", "quillmoor").email);
  otherManager = await signIn(demoByRole("manager", "larkhaven").email);
  admin = await signIn(demoByRole("admin").email);
});
afterAll(() => pool.end());

describe("issuing", () => {
  it("issues one module certificate per completion, even when called twice at once, and mails the link", async () => {
    const cid = await complete(holder.id, "how-systems-work");
    const [a, b] = await Promise.all([issueCertificateForCompletion(cid), issueCertificateForCompletion(cid)]);
    expect(a.length + b.length).toBe(1);
    expect(await issueCertificateForCompletion(cid)).toEqual([]);
    const rows = await certsOf(holder.id);
    expect(rows).toHaveLength(1);
    firstCert = rows[0]!;
    expect(firstCert.kind).toBe("module");
    expect(firstCert.holderName).toBe("Zoë Ñúñez-Łukasz");
    expect(firstCert.organizationName).toBe("Quillmoor Fire Protection");
    expect(Number(firstCert.ceHours)).toBe(hoursOf("how-systems-work"));
    expect(firstCert.expiresAt.toISOString()).toBe(addMonthsUtc(firstCert.issuedAt, validityOf("how-systems-work")).toISOString());
    expect(firstCert.serial).toMatch(/^RSR-\d{4}-\d{6}$/);
    // New codes: 28 symbols of Crockford's base32 (0-9 A-Z without I L O U) = 140 bits; no trailing punctuation.
    // Older base64url codes (24 characters) still verify (tests/integration/verify-input.test.ts).
    expect(firstCert.verificationCode).toMatch(/^[0-9A-HJKMNP-TV-Z]{28}$/);

    const mail = await waitForMail(holder.email, /Your Riser certificate: How a home sprinkler system works/);
    expect(mail.text).toContain(`/verify/${firstCert.verificationCode}`);
    expect(mail.text).toContain(firstCert.serial);
    const link = mail.text.match(/https?:\/\/\S+\/verify\/\S+/)![0];
    const page = await anonymous().fetch(new URL(link).pathname);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Zoë Ñúñez-Łukasz");
  });

  it("renews: a later completion issues a new certificate linked to the previous one", async () => {
    const cid = await complete(holder.id, "how-systems-work", new Date(Date.now() + 1000));
    const [renewal] = await issueCertificateForCompletion(cid, { notify: false });
    expect(renewal).toBeTruthy();
    const [row] = await db.select().from(certificate).where(eq(certificate.id, renewal!.id));
    expect(row!.renewsCertificateId).toBe(firstCert.id);
    expect(row!.serial).not.toBe(firstCert.serial);
    expect(row!.verificationCode).not.toBe(firstCert.verificationCode);
  });

  it("issues a path certificate when the last module of a path completes, once", async () => {
    const p = await person("path");
    const builderSales = catalog.paths.find((x) => x.slug === "builder-sales")!;
    const t0 = Date.now() - 10 * DAY;
    const ids: number[] = [];
    for (const [i, slug] of builderSales.modules.entries()) ids.push(await complete(p.id, slug, new Date(t0 + i * DAY)));
    for (const cid of ids.slice(0, -1)) await issueCertificateForCompletion(cid, { notify: false });
    expect((await certsOf(p.id)).filter((c) => c.kind === "path")).toHaveLength(0);

    const last = await issueCertificateForCompletion(ids.at(-1)!, { notify: false });
    expect(last.map((c) => c.kind).sort()).toEqual(["module", "path"]);
    expect(await issueCertificateForCompletion(ids.at(-1)!, { notify: false })).toEqual([]);
    const all = await certsOf(p.id);
    const pathCert = all.find((c) => c.kind === "path")!;
    expect(pathCert.subjectSlug).toBe("builder-sales");
    expect(pathCert.subjectTitle).toBe(builderSales.title);
    expect(Number(pathCert.ceHours)).toBeCloseTo(builderSales.modules.reduce((n, s) => n + hoursOf(s), 0), 2);
    // never valid longer than the earliest module certificate behind it
    const firstModuleExpiry = Math.min(...all.filter((c) => c.kind === "module").map((c) => c.expiresAt.getTime()));
    expect(pathCert.expiresAt.getTime()).toBe(firstModuleExpiry);
  });

  it("a repair job issues the certificate of a completion whose issue never ran", async () => {
    const p = await person("backfill");
    const cid = await complete(p.id, "fire-and-water-officials");
    expect(await certsOf(p.id)).toHaveLength(0);
    const run = await issueMissingCertificates();
    expect(run.issued).toBeGreaterThanOrEqual(1);
    const rows = await certsOf(p.id);
    expect(rows.map((c) => [c.completionId, c.kind, c.subjectSlug])).toEqual([[cid, "module", "fire-and-water-officials"]]);
    await waitForMail(p.email, /Your Riser certificate: Fire and water officials/);
  });

  it("keeps serials unique and gapless when 50 completions happen at once", async () => {
    const people = await Promise.all(Array.from({ length: 50 }, (_, i) => person(`bulk${i}`)));
    const completions = await Promise.all(people.map((p) => complete(p.id, "freeze-protection")));
    const issued = (await Promise.all(completions.map((cid) => issueCertificateForCompletion(cid, { notify: false })))).flat();
    expect(issued).toHaveLength(50);
    expect(new Set(issued.map((c) => c.serial)).size).toBe(50);
    expect(new Set(issued.map((c) => c.verificationCode)).size).toBe(50);
    const numbers = issued.map((c) => parseSerial(c.serial)!.n).sort((a, b) => a - b);
    expect(numbers.at(-1)! - numbers[0]! + 1).toBe(50);

    // the whole year has no gap: serial numbers are exactly 1..N and the counter says N
    const year = parseSerial(issued[0]!.serial)!.year;
    const yearRows = await db.select({ n: certificate.serialNumber }).from(certificate).where(eq(certificate.serialYear, year));
    const all = yearRows.map((r) => r.n).sort((a, b) => a - b);
    expect(all).toEqual(Array.from({ length: all.length }, (_, i) => i + 1));
    const [counter] = await db.select().from(certificateSerialCounter).where(eq(certificateSerialCounter.year, year));
    expect(counter!.lastNumber).toBe(all.length);
  });
});

describe("PDF download", () => {
  it("gives the holder a PDF with the right type, file name, text and QR code", async () => {
    const { res, bytes } = await getPdf(holderClient, firstCert.id);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="riser-certificate-${firstCert.serial}.pdf"`);
    const doc = await PDFDocument.load(bytes!);
    expect(doc.getTitle()).toContain(firstCert.serial);
    const text = pdfText(bytes!);
    for (const s of ["Zoë Ñúñez-Łukasz", "How a home sprinkler system works", String(hoursOf("how-systems-work")), firstCert.serial]) expect(text).toContain(s);
    expect(qrFromPdf(bytes!)).toBe(`${APP}/verify/${firstCert.verificationCode}`);
  });

  it("lets the organization's manager and admins download, and nobody else", async () => {
    expect((await getPdf(manager, firstCert.id)).res.status).toBe(200);
    expect((await getPdf(admin, firstCert.id)).res.status).toBe(200);
    const other = await getPdf(otherLearner, firstCert.id);
    expect(other.res.status).toBe(403);
    expect(other.res.headers.get("content-type")).toContain("application/json");
    expect((await getPdf(otherManager, firstCert.id)).res.status).toBe(403);
    expect((await getPdf(anonymous(), firstCert.id)).res.status).toBe(401);
    expect((await getPdf(holderClient, 2_000_000_000)).res.status).toBe(404);
    expect((await holderClient.fetch("/api/certificates/abc/pdf")).status).toBe(404);
  });
});

describe("public verification", () => {
  it("shows a valid certificate with exactly the public fields", async () => {
    const res = await anonymous().fetch(`/api/verify/${firstCert.verificationCode}`);
    expect(res.status).toBe(200);
    const body = (await res.json()) as Record<string, unknown>;
    expect(Object.keys(body).sort()).toEqual(PUBLIC_KEYS);
    expect(body).toEqual({
      serial: firstCert.serial,
      holderName: "Zoë Ñúñez-Łukasz",
      title: "How a home sprinkler system works",
      kind: "module",
      ceHours: hoursOf("how-systems-work"),
      issuedAt: firstCert.issuedAt.toISOString(),
      expiresAt: firstCert.expiresAt.toISOString(),
      status: "valid",
    });
    expect(JSON.stringify(body)).not.toContain("@");
    const page = await anonymous().fetch(`/verify/${firstCert.verificationCode}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("genuine and valid today");
    expect(html).not.toContain(holder.email);
  });

  it("shows expired once the expiry date has passed (clock moved in the database)", async () => {
    const p = await person("expired", { name: "Wren Okafor-Lindqvist" });
    const [c] = await issueCertificateForCompletion(await complete(p.id, "pipe-and-joining"), { notify: false });
    await db.update(certificate).set({ expiresAt: new Date(Date.now() - DAY) }).where(eq(certificate.id, c!.id));
    const res = await anonymous().fetch(`/api/verify/${c!.verificationCode}`);
    expect(((await res.json()) as { status: string }).status).toBe("expired");
    const html = await (await anonymous().fetch(`/verify/${c!.verificationCode}`)).text();
    expect(html).toContain("it has expired");
  });

  it("answers 404 for unknown, malformed and wrong-case codes, page and JSON", async () => {
    const unknown = "AAAAAAAAAAAAAAAAAAAAAAAA";
    const swapped = firstCert.verificationCode.replace(/[a-z]/, (ch) => ch.toUpperCase());
    const candidates = [unknown, "short", "not a code at all", "abc.def-ghi", `${firstCert.verificationCode}x`];
    if (swapped !== firstCert.verificationCode) candidates.push(swapped);
    for (const code of candidates) {
      const client = anonymous();
      const api = await client.fetch(`/api/verify/${code}`);
      expect(api.status, code).toBe(404);
      expect(((await api.json()) as { error: string }).error).toMatch(/No Riser certificate matches/);
      const page = await client.fetch(`/verify/${code}`);
      expect(page.status, code).toBe(404);
      expect(await page.text()).toContain("No certificate matches this code");
    }
  });

  it("limits look-ups per client address and answers 429 with a message", async () => {
    const max = Number(process.env.VERIFY_RATE_LIMIT_MAX ?? 30);
    const client = anonymous();
    const statuses: number[] = [];
    for (let i = 0; i < max; i++) statuses.push((await client.fetch(`/api/verify/${firstCert.verificationCode}`)).status);
    expect(statuses.every((s) => s === 200)).toBe(true);
    const limited = await client.fetch(`/api/verify/${firstCert.verificationCode}`);
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(((await limited.json()) as { error: string }).error).toMatch(/Too many certificate look-ups/);
    expect(await (await client.fetch(`/verify/${firstCert.verificationCode}`)).text()).toContain("Too many certificate look-ups");
    // another address is not affected
    expect((await anonymous().fetch(`/api/verify/${firstCert.verificationCode}`)).status).toBe(200);
  });
});

describe("revocation", () => {
  it("needs a manager of the holder's organization and a reason, writes one audit row, then shows revoked", async () => {
    const id = firstCert.id;
    expect((await postJson(otherLearner, `/api/certificates/${id}/revoke`, { reason: "Not mine to revoke" })).status).toBe(403);
    expect((await postJson(otherManager, `/api/certificates/${id}/revoke`, { reason: "Other organization" })).status).toBe(403);
    const noReason = await postJson(manager, `/api/certificates/${id}/revoke`, {});
    expect(noReason.status).toBe(400);
    expect(noReason.json.fieldErrors).toHaveProperty("reason");
    expect((await postJson(manager, `/api/certificates/${id}/revoke`, { reason: "   " })).status).toBe(400);
    expect(await db.select().from(auditLog).where(and(eq(auditLog.action, "certificate.revoke"), eq(auditLog.targetId, String(id))))).toHaveLength(0);

    const reason = "Quiz answers were shared before the attempt";
    const ok = await postJson(manager, `/api/certificates/${id}/revoke`, { reason });
    expect(ok.status).toBe(200);
    expect(ok.json.status).toBe("revoked");
    const again = await postJson(admin, `/api/certificates/${id}/revoke`, { reason: "Twice" });
    expect(again.status).toBe(409);

    const rows = await db.select().from(auditLog).where(and(eq(auditLog.action, "certificate.revoke"), eq(auditLog.targetId, String(id))));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ actorEmail: demoByRole("manager", "quillmoor").email, organizationId: quillmoorId, targetType: "certificate", reason });
    const [row] = await db.select().from(certificate).where(eq(certificate.id, id));
    expect(row!.revokedAt).toBeTruthy();
    expect(row!.revokeReason).toBe(reason);

    const verify = (await (await anonymous().fetch(`/api/verify/${firstCert.verificationCode}`)).json()) as Record<string, unknown>;
    expect(verify.status).toBe("revoked");
    expect(Object.keys(verify).sort()).toEqual(PUBLIC_KEYS); // the reason stays private
    expect(await (await anonymous().fetch(`/verify/${firstCert.verificationCode}`)).text()).toContain("It is not valid");
    const { bytes } = await getPdf(holderClient, id);
    expect(pdfText(bytes!)).toMatch(/Revoked on/);
  });

  it("lets an admin revoke in any organization", async () => {
    const p = await person("builder-side", { org: larkhavenId });
    const [c] = await issueCertificateForCompletion(await complete(p.id, "talking-with-homebuyers"), { notify: false });
    expect((await postJson(manager, `/api/certificates/${c!.id}/revoke`, { reason: "Wrong organization" })).status).toBe(403);
    expect((await postJson(admin, `/api/certificates/${c!.id}/revoke`, { reason: "Issued in error during set-up" })).status).toBe(200);
  });
});

describe("expiry reminder", () => {
  it("refuses the job route without the secret (401) or with a wrong one (403)", async () => {
    expect((await anonymous().fetch("/api/jobs/certificate-reminders", { method: "POST" })).status).toBe(401);
    expect((await anonymous().fetch("/api/jobs/certificate-reminders", { method: "POST", headers: { "x-jobs-secret": "wrong-secret-0123456789" } })).status).toBe(403);
  });

  it("mails once, 30 days before expiry, even when the job runs twice at once and again", async () => {
    const soon = await person("soon");
    const later = await person("later");
    const revoked = await person("revoked-soon");
    const issueExpiringIn = async (p: { id: string }, days: number) => {
      const expiresAt = new Date(Date.now() + days * DAY);
      return (await issueCertificateForCompletion(await complete(p.id, "working-with-trades", addMonthsUtc(expiresAt, -validityOf("working-with-trades"))), { notify: false }))[0]!;
    };
    const due = await issueExpiringIn(soon, 20);
    await issueExpiringIn(later, 45);
    const r = await issueExpiringIn(revoked, 10);
    await db.update(certificate).set({ revokedAt: new Date(), revokeReason: "test" }).where(eq(certificate.id, r.id));

    const secret = process.env.JOBS_SECRET!;
    const call = () => anonymous().fetch("/api/jobs/certificate-reminders", { method: "POST", headers: { "x-jobs-secret": secret } });
    const runs = await Promise.all([call(), call()]);
    expect(runs.map((x) => x.status)).toEqual([200, 200]);
    expect((await call()).status).toBe(200);

    await waitForMail(soon.email, /expires in 20 days/);
    await new Promise((res) => setTimeout(res, 1000)); // a second copy would have arrived by now
    expect((await mailsTo(soon.email)).filter((m) => /expires in/.test(m.subject))).toHaveLength(1);
    expect(await mailsTo(later.email)).toHaveLength(0);
    expect(await mailsTo(revoked.email)).toHaveLength(0);
    const [row] = await db.select().from(certificate).where(eq(certificate.id, due.id));
    expect(row!.reminderSentAt).toBeTruthy();

    // move the clock 16 days on: the 45-day certificate is now due, once
    const moved = new Date(Date.now() + 16 * DAY);
    await Promise.all([sendExpiryReminders({ now: moved }), sendExpiryReminders({ now: moved })]);
    await waitForMail(later.email, /expires in 29 days/);
    await new Promise((res) => setTimeout(res, 1000));
    expect(await mailsTo(later.email)).toHaveLength(1);
    expect((await mailsTo(soon.email)).filter((m) => /expires in/.test(m.subject))).toHaveLength(1);
  });

  it("skips a certificate that was already renewed", async () => {
    const p = await person("renewed");
    const expiresAt = new Date(Date.now() + 12 * DAY);
    const [old] = await issueCertificateForCompletion(await complete(p.id, "sprinklers-and-coverage", addMonthsUtc(expiresAt, -validityOf("sprinklers-and-coverage"))), { notify: false });
    await issueCertificateForCompletion(await complete(p.id, "sprinklers-and-coverage"), { notify: false });
    await sendExpiryReminders();
    const [row] = await db.select().from(certificate).where(eq(certificate.id, old!.id));
    expect(row!.reminderSentAt).toBeNull();
    expect(await mailsTo(p.email)).toHaveLength(0);
  });
});

describe("demo data", () => {
  it("has a valid, an expiring, an expired and a revoked certificate for the demo people", async () => {
    const emails = ["kasimir@quillmoor.example", "rafaela@quillmoor.example", "callum@quillmoor.example"];
    const people = await db.select({ id: user.id, email: user.email }).from(user).where(inArray(user.email, emails));
    const rows = await db.select().from(certificate).where(inArray(certificate.userId, people.map((p) => p.id)));
    const now = Date.now();
    const idOf = (e: string) => people.find((p) => p.email === e)!.id;
    expect(rows.some((c) => c.userId === idOf("kasimir@quillmoor.example") && c.kind === "path" && !c.revokedAt && c.expiresAt.getTime() > now)).toBe(true);
    expect(rows.some((c) => c.userId === idOf("rafaela@quillmoor.example") && c.expiresAt.getTime() - now < 30 * DAY && c.expiresAt.getTime() > now)).toBe(true);
    expect(rows.some((c) => c.userId === idOf("callum@quillmoor.example") && c.expiresAt.getTime() < now)).toBe(true);
    expect(rows.some((c) => c.userId === idOf("callum@quillmoor.example") && c.revokedAt)).toBe(true);
  });
});
