// Practical sign-offs over the real route handlers, MariaDB and the fake S3 server that npm test
// starts (scripts/s3-fake.mjs): upload → review → approval → completion, every bad input, access
// to evidence across organizations, metadata stripping, and the orphan cleanup job.
import { randomUUID } from "node:crypto";
import { connect } from "node:net";
import path from "node:path";
import { spawnSync } from "node:child_process";
import { hashPassword } from "better-auth/crypto";
import { and, eq } from "drizzle-orm";
import { PDFDocument } from "pdf-lib";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { account, auditLog, moduleCompletion, organization, signOff, signOffEvidence, team, user } from "@/db/schema";
import { MAX_UPLOAD_BYTES } from "@/lib/signoffs/schemas";
import { removeOrphanedEvidence } from "@/lib/signoffs/cleanup";
import { getObjectBytes, headObject, listObjects, putObject } from "@/lib/storage";
import { exifHasGps, jpegWithGps } from "../helpers/exif";
import { APP, anonymous, freshIp, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { answersFor, catalog } from "../helpers/quiz";
import { readAndComplete } from "../helpers/fixtures";

const PASSWORD = "sign-off-test-pass-2026";
const PJ = "pipe-and-joining";
const CPVC = "pj-cpvc-joint-and-cure"; // required by pipe-and-joining/module.yaml
const SUPPORT = "pj-support-and-restrain"; // not required
const ITM = "inspection-testing-maintenance";
const ALARM = "itm-yearly-alarm-test";

type Person = { id: string; email: string; name: string; client: Client };

async function makeOrg(name: string) {
  const id = randomUUID();
  const teamId = randomUUID();
  await db.insert(organization).values({ id, name: `${name} ${Date.now().toString(36)}`, kind: "contractor", seats: 50 });
  await db.insert(team).values({ id: teamId, organizationId: id, name: "Test crew" });
  return { id, teamId };
}

let hash: string;
async function person(tag: string, role: "learner" | "manager" | "admin", org: { id: string; teamId: string } | null): Promise<Person> {
  const id = randomUUID();
  const email = uniqueEmail(tag);
  const name = `Test ${tag} ${id.slice(0, 4)}`;
  await db.insert(user).values({ id, name, email, emailVerified: true, role, organizationId: org?.id ?? null, teamId: org?.teamId ?? null });
  await db.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: hash });
  return { id, email, name, client: await signIn(email, PASSWORD, freshIp()) };
}

type Part = { name: string; bytes: Uint8Array; type?: string };

async function upload(client: Client, opts: { module?: string; skill?: string; note?: string; files: Part[] }) {
  const form = new FormData();
  form.set("module", opts.module ?? PJ);
  form.set("skill", opts.skill ?? CPVC);
  if (opts.note !== undefined) form.set("note", opts.note);
  for (const f of opts.files) form.append("files", new Blob([Buffer.from(f.bytes)], { type: f.type ?? "application/octet-stream" }), f.name);
  const res = await client.fetch("/api/sign-offs", { method: "POST", body: form });
  const text = await res.text();
  let json: Record<string, unknown> = {};
  try {
    json = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, json, text };
}

async function keysOf(userId: string): Promise<string[]> {
  const keys: string[] = [];
  for await (const page of listObjects(`sign-offs/${userId}/`)) keys.push(...page.map((o) => o.key));
  return keys.sort();
}
const rowsOf = (userId: string) => db.select().from(signOff).where(eq(signOff.userId, userId));

async function onePagePdf(): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.addPage([612, 792]).drawText("Cure log — Juniper Flats lot 3 (invented)", { x: 50, y: 700, size: 14 });
  return doc.save();
}

let orgA: { id: string; teamId: string };
let orgB: { id: string; teamId: string };
let learner: Person, peer: Person, managerA: Person, managerB: Person, admin: Person, badInput: Person;

beforeAll(async () => {
  hash = await hashPassword(PASSWORD);
  orgA = await makeOrg("Sign-off Test Sprinkler Co");
  orgB = await makeOrg("Sign-off Other Builder");
  learner = await person("so-learner", "learner", orgA);
  peer = await person("so-peer", "learner", orgA);
  badInput = await person("so-bad", "learner", orgA);
  managerA = await person("so-mgr-a", "manager", orgA);
  managerB = await person("so-mgr-b", "manager", orgB);
  admin = await person("so-admin", "admin", null);
});
afterAll(() => pool.end());

describe("upload → review → approval", () => {
  let signOffId: string;
  let photo: { id: string };
  let pdf: { id: string };

  it("a passed quiz and all lessons do not complete a module whose required sign-off is missing", async () => {
    const mod = catalog.modules.find((m) => m.slug === PJ)!;
    expect(mod.meta.requiredSkills).toContain(CPVC);
    await readAndComplete(learner.client, learner.id, PJ, mod.lessons.map((l) => l.slug));
    const attempt = await postJson(learner.client, "/api/quiz/attempts", { module: PJ });
    expect(attempt.status).toBe(201);
    const id = attempt.json.id as string;
    expect((await postJson(learner.client, `/api/quiz/attempts/${id}/answers`, { answers: await answersFor(id) }, "PUT")).status).toBe(200);
    const graded = await postJson(learner.client, `/api/quiz/attempts/${id}/submit`, {});
    expect(graded.json.passed).toBe(true);
    expect(await db.select().from(moduleCompletion).where(and(eq(moduleCompletion.userId, learner.id), eq(moduleCompletion.moduleSlug, PJ)))).toHaveLength(0);
    const quizPage = (await (await learner.client.fetch(`/modules/${PJ}/quiz`)).text()).replace(/<!-- -->/g, "");
    expect(quizPage.includes("sign-off: Makes a CPVC solvent-cement joint"), "the quiz page names the missing sign-off").toBe(true);
  });

  it("stores a photo and a PDF, with a thumbnail for the photo, and answers 201", async () => {
    const res = await upload(learner.client, {
      note: "Hall branch line, last joint 10:05 at about 55 °F.",
      files: [
        { name: "IMG_2207.JPG", bytes: await jpegWithGps(1600, 1200), type: "image/jpeg" },
        { name: "cure-log.pdf", bytes: await onePagePdf(), type: "application/pdf" },
      ],
    });
    expect(res.status, res.text).toBe(201);
    expect(res.json.status).toBe("submitted");
    signOffId = res.json.id as string;
    const evidence = res.json.evidence as { id: string; contentType: string; thumbnail: boolean }[];
    expect(evidence.map((e) => [e.contentType, e.thumbnail])).toEqual([
      ["image/jpeg", true],
      ["application/pdf", false],
    ]);
    photo = evidence[0]!;
    pdf = evidence[1]!;
    const rows = await db.select().from(signOffEvidence).where(eq(signOffEvidence.signOffId, signOffId));
    expect(rows).toHaveLength(2);
    expect(await keysOf(learner.id)).toEqual([rows[0]!.objectKey, rows[0]!.thumbnailKey!, rows[1]!.objectKey].sort());
    const managerMail = await waitForMail(managerA.email, /Sign-off to review/);
    expect(managerMail.text).toContain("/team/sign-offs");
  });

  it("keeps no GPS position (no EXIF at all) in the photo as stored in S3", async () => {
    const [row] = await db.select().from(signOffEvidence).where(eq(signOffEvidence.id, photo.id));
    const stored = await getObjectBytes(row!.objectKey);
    expect(stored).not.toBeNull();
    const meta = await sharp(Buffer.from(stored!)).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(exifHasGps(meta.exif)).toBe(false);
    const thumb = await sharp(Buffer.from((await getObjectBytes(row!.thumbnailKey!))!)).metadata();
    expect(thumb.exif).toBeUndefined();
    expect(Math.max(thumb.width!, thumb.height!)).toBeLessThanOrEqual(480);
  });

  it("serves the evidence to the learner, their organization's manager and an admin only", async () => {
    const url = (id: string, thumb = false) => `/api/sign-offs/${signOffId}/evidence/${id}${thumb ? "?thumb=1" : ""}`;
    for (const who of [learner, managerA, admin]) {
      const img = await who.client.fetch(url(photo.id));
      expect(img.status).toBe(200);
      expect(img.headers.get("content-type")).toBe("image/jpeg");
      expect((await sharp(Buffer.from(await img.arrayBuffer())).metadata()).exif).toBeUndefined();
      const th = await who.client.fetch(url(photo.id, true));
      expect(th.status).toBe(200);
      const doc = await who.client.fetch(url(pdf.id));
      expect(doc.status).toBe(200);
      expect(doc.headers.get("content-type")).toBe("application/pdf");
      expect(Buffer.from(await doc.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-"); // ISO 32000-1 §7.5.2 header
    }
    for (const who of [managerB, peer]) {
      expect((await who.client.fetch(url(photo.id))).status).toBe(403);
      expect((await who.client.fetch(url(photo.id, true))).status).toBe(403);
      expect((await who.client.fetch(url(pdf.id))).status).toBe(403);
    }
    expect((await anonymous().fetch(url(photo.id))).status).toBe(401);
    expect((await learner.client.fetch(url(pdf.id, true))).status).toBe(404); // PDFs have no thumbnail
    expect((await learner.client.fetch(`/api/sign-offs/${randomUUID()}/evidence/${photo.id}`)).status).toBe(404); // evidence of another sign-off id
  });

  it("shows the submission in its own organization's queue only", async () => {
    const mine = await (await managerA.client.fetch("/team/sign-offs")).text();
    expect(mine.includes(learner.name) && mine.includes("Hall branch line"), "own manager's queue lists it").toBe(true);
    const other = await (await managerB.client.fetch("/team/sign-offs")).text();
    expect(other.includes(learner.name), "another organization's queue must not list it").toBe(false);
    expect((await learner.client.fetch("/team/sign-offs")).status).toBe(403);
  });

  it("refuses a review from another organization, from the learner, and a second live submission", async () => {
    expect((await postJson(managerB.client, `/api/sign-offs/${signOffId}/review`, { decision: "approve" })).status).toBe(403);
    expect((await postJson(learner.client, `/api/sign-offs/${signOffId}/review`, { decision: "approve" })).status).toBe(403);
    const again = await upload(learner.client, { files: [{ name: "again.jpg", bytes: await jpegWithGps(200, 150) }] });
    expect(again.status).toBe(409);
    expect(again.json.error).toMatch(/already waiting for review/);
  });

  it("approval by the organization's manager completes the module, mails the learner and is audited", async () => {
    const res = await postJson(managerA.client, `/api/sign-offs/${signOffId}/review`, { decision: "approve", comment: "Full insertion, cure chart value recorded." });
    expect(res.status, res.text).toBe(200);
    expect(res.json.status).toBe("approved");
    expect(res.json.moduleCompleted).toBe(true);
    expect(await db.select().from(moduleCompletion).where(and(eq(moduleCompletion.userId, learner.id), eq(moduleCompletion.moduleSlug, PJ)))).toHaveLength(1);
    const mail = await waitForMail(learner.email, /^Signed off: Makes a CPVC/);
    expect(mail.text).toContain("Full insertion");
    expect(mail.text).toContain(`/modules/${PJ}/sign-offs`);
    const audits = await db.select().from(auditLog).where(eq(auditLog.targetId, signOffId));
    expect(audits.map((a) => a.action).sort()).toEqual(["signoff.approve", "signoff.submit"]);
    expect(audits.find((a) => a.action === "signoff.approve")!.actorId).toBe(managerA.id);
    expect((await postJson(managerA.client, `/api/sign-offs/${signOffId}/review`, { decision: "return", comment: "changed my mind" })).status).toBe(409);
    const page = (await (await learner.client.fetch(`/modules/${PJ}/sign-offs`)).text()).replace(/<!-- -->/g, "");
    expect(page.includes(`Signed off by ${managerA.name}`), "the learner's page names the reviewer").toBe(true);
  });
});

describe("returning a sign-off", () => {
  it("needs a comment, mails it to the learner, and lets them send new evidence", async () => {
    const first = await upload(peer.client, { module: ITM, skill: ALARM, files: [{ name: "test-record.jpg", bytes: await jpegWithGps(400, 300) }] });
    expect(first.status, first.text).toBe(201);
    const id = first.json.id as string;
    const bare = await postJson(managerA.client, `/api/sign-offs/${id}/review`, { decision: "return" });
    expect(bare.status).toBe(400);
    expect((bare.json.fieldErrors as Record<string, string[]>).comment![0]).toMatch(/Say what is missing/);
    const ret = await postJson(managerA.client, `/api/sign-offs/${id}/review`, { decision: "return", comment: "The record does not show when the alarm sounded." });
    expect(ret.status).toBe(200);
    const mail = await waitForMail(peer.email, /^Sign-off returned/);
    expect(mail.text).toContain("does not show when the alarm sounded");
    const second = await upload(peer.client, { module: ITM, skill: ALARM, note: "Now with the time", files: [{ name: "record-2.png", bytes: await sharp({ create: { width: 300, height: 200, channels: 3, background: "#fff" } }).png().toBuffer() }] });
    expect(second.status, second.text).toBe(201);
    expect((await rowsOf(peer.id)).map((r) => r.status).sort()).toEqual(["returned", "submitted"]);
    const audits = await db.select().from(auditLog).where(and(eq(auditLog.targetId, id), eq(auditLog.action, "signoff.return")));
    expect(audits[0]!.reason).toContain("alarm sounded");
  });
});

describe("bad input: a clear message and nothing stored", () => {
  async function expectNothingStored<T>(fn: () => Promise<T>): Promise<T> {
    const keysBefore = await keysOf(badInput.id);
    const rowsBefore = (await rowsOf(badInput.id)).length;
    const out = await fn();
    expect(await keysOf(badInput.id)).toEqual(keysBefore);
    expect((await rowsOf(badInput.id)).length).toBe(rowsBefore);
    return out;
  }

  it("refuses text named .jpg (the type is read from the bytes)", async () => {
    const r = await expectNothingStored(() => upload(badInput.client, { files: [{ name: "joint.jpg", bytes: new TextEncoder().encode("just some words, no picture"), type: "image/jpeg" }] }));
    expect(r.status).toBe(415);
    expect(r.json.error).toMatch(/"joint\.jpg" is not a photo or PDF.*whatever its name says/);
  });

  it("refuses files over 8 MB in all, whether the declared length or the files say so", async () => {
    const justOver = await expectNothingStored(() => upload(badInput.client, { files: [{ name: "big.jpg", bytes: new Uint8Array(MAX_UPLOAD_BYTES + 1) }] }));
    expect(justOver.status).toBe(413);
    expect(justOver.json.error).toMatch(/limit is 8 MB in all/);
    const huge = await expectNothingStored(() => upload(badInput.client, { files: [{ name: "huge.pdf", bytes: new Uint8Array(12 * 1024 * 1024) }] }));
    expect(huge.status).toBe(413);
    expect(huge.json.error).toMatch(/limit is 8 MB/);
  });

  it("refuses an empty file", async () => {
    const r = await expectNothingStored(() => upload(badInput.client, { files: [{ name: "empty.jpg", bytes: new Uint8Array(0) }] }));
    expect(r.status).toBe(400);
    expect(r.json.error).toMatch(/"empty\.jpg" is empty \(0 bytes\)/);
  });

  it("refuses a HEIC photo it cannot decode, saying to export it as JPEG", async () => {
    // ISO/IEC 23008-12 (HEIF): "ftyp" box with major brand "heic", no decodable image
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 0x18]), Buffer.from("ftypheic"), Buffer.from([0, 0, 0, 0]), Buffer.from("mif1heic"), Buffer.alloc(256)]);
    const r = await expectNothingStored(() => upload(badInput.client, { files: [{ name: "IMG_3001.HEIC", bytes: heic, type: "image/heic" }] }));
    expect(r.status).toBe(415);
    expect(r.json.error).toMatch(/^HEIC photos cannot be read here — export as JPEG/);
  });

  it("refuses a missing file, too many files, an unknown skill, a long note and a non-form body", async () => {
    const small = await jpegWithGps(100, 80);
    const none = await expectNothingStored(() => upload(badInput.client, { files: [] }));
    expect(none.status).toBe(400);
    expect((none.json.fieldErrors as Record<string, string[]>).files![0]).toMatch(/at least one/);
    const four = await expectNothingStored(() => upload(badInput.client, { files: [1, 2, 3, 4].map((i) => ({ name: `${i}.jpg`, bytes: small })) }));
    expect(four.status).toBe(400);
    expect(four.json.error).toMatch(/up to 3 files/);
    const skill = await expectNothingStored(() => upload(badInput.client, { skill: "no-such-skill", files: [{ name: "a.jpg", bytes: small }] }));
    expect(skill.status).toBe(400);
    expect(skill.json.fieldErrors).toHaveProperty("skill");
    const note = await expectNothingStored(() => upload(badInput.client, { note: "x".repeat(1001), files: [{ name: "a.jpg", bytes: small }] }));
    expect(note.status).toBe(400);
    expect(note.json.fieldErrors).toHaveProperty("note");
    const json = await expectNothingStored(() => postJson(badInput.client, "/api/sign-offs", { module: PJ, skill: CPVC }));
    expect(json.status).toBe(400);
    expect(json.json.error).toMatch(/multipart\/form-data/);
  });

  it("refuses a form whose body ends in the middle of a file", async () => {
    const boundary = "----riser-test-boundary";
    const photo = await jpegWithGps(300, 200);
    const head = Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="module"\r\n\r\n${PJ}\r\n` +
        `--${boundary}\r\nContent-Disposition: form-data; name="skill"\r\n\r\n${CPVC}\r\n` +
        `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="cut.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
    );
    const cut = Buffer.concat([head, photo.subarray(0, photo.length / 2)]); // no closing boundary
    const r = await expectNothingStored(async () => {
      const res = await badInput.client.fetch("/api/sign-offs", { method: "POST", headers: { "content-type": `multipart/form-data; boundary=${boundary}` }, body: cut });
      return { status: res.status, json: (await res.json()) as { error: string } };
    });
    expect(r.status).toBe(400);
    expect(r.json.error).toMatch(/did not arrive complete/);
  });

  it("stores nothing when the connection drops before the declared Content-Length arrives", async () => {
    const boundary = "----riser-test-drop";
    const photo = await jpegWithGps(600, 400);
    const body = Buffer.concat([
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="module"\r\n\r\n${PJ}\r\n--${boundary}\r\nContent-Disposition: form-data; name="skill"\r\n\r\n${SUPPORT}\r\n`),
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="drop.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`),
      photo,
      Buffer.from(`\r\n--${boundary}--\r\n`),
    ]);
    const u = new URL(APP);
    const status = await expectNothingStored(
      () =>
        new Promise<string>((resolve, reject) => {
          const socket = connect({ host: u.hostname, port: Number(u.port) }, () => {
            socket.write(
              `POST /api/sign-offs HTTP/1.1\r\nHost: ${u.host}\r\nOrigin: ${APP}\r\nCookie: ${badInput.client.cookie}\r\nX-Forwarded-For: ${badInput.client.ip}\r\n` +
                `Content-Type: multipart/form-data; boundary=${boundary}\r\nContent-Length: ${body.length}\r\nConnection: close\r\n\r\n`,
            );
            socket.write(body.subarray(0, Math.floor(body.length / 2)));
            setTimeout(() => socket.end(), 300); // half-close: the rest never comes
          });
          let answer = "";
          socket.on("data", (d) => (answer += d.toString("latin1")));
          socket.on("close", () => resolve(answer.split("\r\n")[0] ?? ""));
          socket.on("error", reject);
          socket.setTimeout(20_000, () => {
            socket.destroy();
            resolve("(no answer)");
          });
        }),
    );
    expect(status).toMatch(/^HTTP\/1\.1 400/);
    // the server is fine afterwards
    expect((await anonymous().fetch("/api/health")).status).toBe(200);
  });

  it("accepts a name full of ../ and slashes, but shows it sanitised and never uses it in the key", async () => {
    const r = await upload(badInput.client, { skill: SUPPORT, files: [{ name: "../../etc/passwd/..\\..\\hanger spacing.jpg", bytes: await jpegWithGps(320, 240) }] });
    expect(r.status, r.text).toBe(201);
    const ev = (r.json.evidence as { id: string; name: string }[])[0]!;
    expect(ev.name).toBe("hanger spacing.jpg");
    const [row] = await db.select().from(signOffEvidence).where(eq(signOffEvidence.id, ev.id));
    expect(row!.objectKey).toMatch(new RegExp(`^sign-offs/${badInput.id}/${r.json.id}/${ev.id}\\.jpg$`));
    expect(row!.objectKey).not.toMatch(/\.\.|passwd|hanger/);
    const res = await badInput.client.fetch(`/api/sign-offs/${r.json.id}/evidence/${ev.id}`);
    expect(res.headers.get("content-disposition")).toBe(`inline; filename="hanger spacing.jpg"; filename*=UTF-8''hanger%20spacing.jpg`);
  });

  it("keeps one live submission per skill when uploads race, and deletes the losers' files", async () => {
    const racer = await person("so-race", "learner", orgA);
    const photo = await jpegWithGps(500, 400);
    const results = await Promise.all(Array.from({ length: 4 }, (_, i) => upload(racer.client, { skill: SUPPORT, files: [{ name: `r${i}.jpg`, bytes: photo }] })));
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    const rows = await db.select().from(signOffEvidence).innerJoin(signOff, eq(signOff.id, signOffEvidence.signOffId)).where(eq(signOff.userId, racer.id));
    expect(rows).toHaveLength(1);
    const ev = rows[0]!.sign_off_evidence;
    expect(await keysOf(racer.id)).toEqual([ev.objectKey, ev.thumbnailKey!].sort());
  });
});

describe("orphan cleanup", () => {
  it("deletes an object no evidence row points to and keeps the ones that have rows", async () => {
    const orphan = `sign-offs/${learner.id}/${randomUUID()}/${randomUUID()}.jpg`;
    await putObject(orphan, new Uint8Array(await jpegWithGps(50, 40)), "image/jpeg");
    const kept = await keysOf(learner.id);
    expect(kept).toContain(orphan);
    // an hour from now the orphan counts as abandoned (the job leaves younger objects alone)
    const fresh = await removeOrphanedEvidence({ olderThanMinutes: 60 });
    expect(fresh.keys).not.toContain(orphan);
    const later = await removeOrphanedEvidence({ olderThanMinutes: 60, now: new Date(Date.now() + 61 * 60_000) });
    expect(later.keys).toContain(orphan);
    expect(await headObject(orphan)).toBeNull();
    for (const k of kept.filter((k) => k !== orphan)) expect(await headObject(k), k).not.toBeNull();
  });

  it("is wired into the jobs runner (npm run jobs:run -- evidence-orphans)", () => {
    const r = spawnSync(path.resolve("node_modules/.bin/tsx"), ["--conditions=react-server", path.resolve("scripts/jobs.ts"), "evidence-orphans"], { env: process.env, encoding: "utf8", timeout: 60_000 });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/\[jobs\] evidence-orphans: \{"scanned":\d+,"deleted":\d+/);
  });
});
