// Training history downloads against the running app: the person's own and their manager's, the
// access rules (another organization's manager, unknown people, bad formats), and the organization's
// reporting period changing the totals, with its audit row, the seat time per module, and a team's
// ZIP. PDF text read with poppler's pdftotext; the ZIP (made with fflate) read back with yauzl.
import { and, asc, eq } from "drizzle-orm";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import yauzl from "yauzl";
import { db } from "@/db/client";
import { auditLog, catalogLesson, catalogModule, lessonOpen, lessonProgress } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { TEAM_ZIP_MAX_PEOPLE } from "@/lib/credentials";
import { postJson, type Client } from "../helpers/http";
import { clientOf, completion, createPeople, fixtureOrg, fixturePerson, gradedAttempt, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";
import { pdfText } from "../helpers/pdf";

let org: FixtureOrg;
let learner: FixturePerson;
let crewmate: FixturePerson;
let otherOrg: FixtureOrg;
const codesOf = new Map<string, string[]>();
let learnerClient: Client;
let manager: Client;
let otherManager: Client;
const codes: string[] = [];
const serials: string[] = [];

async function issue(person: FixturePerson, moduleSlug: string, at: Date) {
  const attemptId = await gradedAttempt(person, moduleSlug, true, at);
  const [c] = await issueCertificateForCompletion(await completion(person.id, moduleSlug, attemptId, at), { notify: false });
  codesOf.set(person.id, [...(codesOf.get(person.id) ?? []), c!.verificationCode]);
  if (person.id !== learner.id) return;
  codes.push(c!.verificationCode);
  serials.push(c!.serial);
}

/** Every entry of a ZIP, read with yauzl (another library than the one that wrote it). */
function unzip(buf: Buffer): Promise<Map<string, Buffer>> {
  return new Promise((resolve, reject) => {
    yauzl.fromBuffer(buf, { lazyEntries: true, validateEntrySizes: true }, (err, zip) => {
      if (err || !zip) return reject(err ?? new Error("no zip"));
      const out = new Map<string, Buffer>();
      zip.on("error", reject);
      zip.on("end", () => resolve(out));
      zip.on("entry", (entry: yauzl.Entry) => {
        zip.openReadStream(entry, (e, stream) => {
          if (e || !stream) return reject(e ?? new Error("no stream"));
          const parts: Buffer[] = [];
          stream.on("data", (d: Buffer) => parts.push(d));
          stream.on("error", reject);
          stream.on("end", () => {
            out.set(entry.fileName, Buffer.concat(parts));
            zip.readEntry();
          });
        });
      });
      zip.readEntry();
    });
  });
}

const csvRows = async (res: Response) => Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;

beforeAll(async () => {
  org = await fixtureOrg(`History Crew ${Date.now()}`, { teams: ["Zip crew", "Empty crew", "Huge crew"] });
  learner = await fixturePerson(org, { name: "Odalys Fenwright", teamId: org.teams["Zip crew"] });
  crewmate = await fixturePerson(org, { name: "Brisa / Talloway", teamId: org.teams["Zip crew"] });
  learnerClient = await clientOf(learner.id);
  manager = await clientOf((await fixturePerson(org, { name: "History Manager", role: "manager" })).id);
  otherOrg = await fixtureOrg(`Other History Org ${Date.now()}`, { teams: ["Their crew"] });
  otherManager = await clientOf((await fixturePerson(otherOrg, { name: "Other Manager", role: "manager" })).id);
  await fixturePerson(otherOrg, { name: "Their Installer", teamId: otherOrg.teams["Their crew"] });
  // one certificate in June 2025 and one in August 2025: one calendar year, two July-to-June periods
  await issue(learner, "freeze-protection", new Date("2025-06-15T12:00:00Z"));
  await issue(learner, "pipe-and-joining", new Date("2025-08-15T12:00:00Z"));
  await issue(crewmate, "how-systems-work", new Date("2025-09-01T12:00:00Z"));
  // seat time: two freeze-protection lessons opened and completed 12 and 20 minutes later by the
  // server's stamps (32 minutes); the second also carries a phone-reported time that must not count
  const lessons = await db
    .select({ id: catalogLesson.id })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(catalogModule.slug, "freeze-protection"))
    .orderBy(asc(catalogLesson.id))
    .limit(2);
  expect(lessons).toHaveLength(2);
  const opened = new Date("2025-06-10T09:00:00Z");
  await db.insert(lessonOpen).values(lessons.map((l) => ({ userId: learner.id, lessonId: l.id, firstOpenedAt: opened })));
  await db.insert(lessonProgress).values([
    { userId: learner.id, lessonId: lessons[0]!.id, completedAt: new Date(opened.getTime() + 12 * 60_000) },
    { userId: learner.id, lessonId: lessons[1]!.id, completedAt: new Date(opened.getTime() + 20 * 60_000), deviceReadingSeconds: 5 * 3600, deviceMarkedAt: opened },
  ]);
});

describe("training history", () => {
  it("the person downloads their own PDF with every serial and verification code", async () => {
    const res = await learnerClient.fetch("/api/account/training-history?format=pdf");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="riser-training-history-odalys-fenwright-/);
    const text = pdfText(new Uint8Array(await res.arrayBuffer())).replace(/\s+/g, " ");
    expect(text).toContain("Odalys Fenwright");
    for (const s of serials) expect(text).toContain(s);
    for (const c of codes) expect(text.replace(/-/g, "")).toContain(c);
  });

  it("their manager downloads the CSV; another organization's manager and unknown people get 403 / 404; a bad format 400", async () => {
    const ok = await manager.fetch(`/api/team/people/${learner.id}/training-history?format=csv`);
    expect(ok.status).toBe(200);
    const rows = await csvRows(ok);
    expect(rows.filter((r) => r[0] === "Certificate").map((r) => r[9]).sort()).toEqual([...serials].sort());
    expect((await otherManager.fetch(`/api/team/people/${learner.id}/training-history?format=csv`)).status).toBe(403);
    const missing = await manager.fetch("/api/team/people/00000000-0000-4000-8000-000000000000/training-history");
    expect(missing.status).toBe(404);
    const bad = await manager.fetch(`/api/team/people/${learner.id}/training-history?format=docx`);
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { error: string }).error).toMatch(/format=pdf/);
    // a learner cannot reach the manager route, even for themselves
    expect((await learnerClient.fetch(`/api/team/people/${learner.id}/training-history`)).status).toBe(403);
  });

  it("totals by calendar year until the organization sets its licence period; the change is audited", async () => {
    const before = (await csvRows(await learnerClient.fetch("/api/account/training-history?format=csv"))).filter((r) => r[0] === "Period total");
    expect(before.map((r) => r[7])).toEqual(["2025"]);

    const refused = await postJson(manager, "/api/team/reporting-period", { startYear: 2025, startMonth: 7, lengthMonths: 7 });
    expect(refused.status).toBe(400);
    expect((refused.json.fieldErrors as Record<string, string[]>).lengthMonths?.[0]).toMatch(/months/);

    const saved = await postJson(manager, "/api/team/reporting-period", { startYear: 2025, startMonth: 7, lengthMonths: 12 });
    expect(saved.status).toBe(200);
    const [row] = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, org.id), eq(auditLog.action, "organization.reporting-period")));
    expect(row?.details).toMatchObject({ after: { startYear: 2025, startMonth: 7, lengthMonths: 12 } });

    const after = (await csvRows(await learnerClient.fetch("/api/account/training-history?format=csv"))).filter((r) => r[0] === "Period total");
    expect(after.map((r) => r[7])).toEqual(["Jul 2025 – Jun 2026", "Jul 2024 – Jun 2025"]);
  });

  it("shows the server-measured seat time per module (not the phone's), in the CSV and the PDF", async () => {
    const rows = await csvRows(await learnerClient.fetch("/api/account/training-history?format=csv"));
    const seat = rows[0]!.indexOf("Seat time (minutes)");
    expect(seat).toBeGreaterThan(0);
    const done = Object.fromEntries(rows.filter((r) => r[0] === "Completion").map((r) => [r[1], r[seat]]));
    expect(Object.values(done).sort()).toEqual(["", "32"]); // freeze protection 12 + 20 min; pipe and joining none recorded
    const text = pdfText(new Uint8Array(await (await learnerClient.fetch("/api/account/training-history")).arrayBuffer())).replace(/\s+/g, " ");
    expect(text).toContain("Seat time 32 min read");
    expect(text).not.toMatch(/Seat time 3\d\d min/); // 5 h reported by the phone is not used
  });

  it("a manager downloads one ZIP of the team: each member's PDF (with their codes) and CSV; scoped to the organization; capped", async () => {
    const res = await manager.fetch(`/api/team/teams/${org.teams["Zip crew"]}/training-history`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/zip");
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="riser-training-history-team-zip-crew-\d{4}-\d{2}-\d{2}\.zip"/);
    const files = await unzip(Buffer.from(await res.arrayBuffer()));
    expect([...files.keys()].sort()).toEqual(
      [`brisa-talloway-${crewmate.id}.csv`, `brisa-talloway-${crewmate.id}.pdf`, `odalys-fenwright-${learner.id}.csv`, `odalys-fenwright-${learner.id}.pdf`].map((n) => n.toLowerCase()).sort(),
    );
    for (const name of files.keys()) expect(name).not.toMatch(/[\\/]|\.\./);
    for (const p of [learner, crewmate]) {
      const base = `${p.name.toLowerCase().replace(/[^a-z0-9]+/g, "-")}-${p.id.toLowerCase()}`;
      const pdf = files.get(`${base}.pdf`)!;
      expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
      const text = pdfText(new Uint8Array(pdf)).replace(/\s+/g, " ").replace(/-/g, "");
      expect(text).toContain(p.name.replace(/-/g, ""));
      expect(codesOf.get(p.id)!.length).toBeGreaterThan(0);
      for (const c of codesOf.get(p.id)!) expect(text).toContain(c);
      const csv = Papa.parse<string[]>(files.get(`${base}.csv`)!.toString("utf8").replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;
      expect(csv.filter((r) => r[0] === "Certificate")).toHaveLength(codesOf.get(p.id)!.length);
    }
    // another organization's team → 403 (and theirs to us); unknown team → 404; empty → 409; too large → 413
    expect((await manager.fetch(`/api/team/teams/${otherOrg.teams["Their crew"]}/training-history`)).status).toBe(403);
    expect((await otherManager.fetch(`/api/team/teams/${org.teams["Zip crew"]}/training-history`)).status).toBe(403);
    expect((await manager.fetch("/api/team/teams/00000000-0000-4000-8000-000000000000/training-history")).status).toBe(404);
    expect((await learnerClient.fetch(`/api/team/teams/${org.teams["Zip crew"]}/training-history`)).status).toBe(403);
    const empty = await manager.fetch(`/api/team/teams/${org.teams["Empty crew"]}/training-history`);
    expect(empty.status).toBe(409);
    expect(((await empty.json()) as { error: string }).error).toMatch(/no people/);
    await createPeople(TEAM_ZIP_MAX_PEOPLE + 1, { organizationId: org.id, teamId: org.teams["Huge crew"], tag: "zipcap" });
    const huge = await manager.fetch(`/api/team/teams/${org.teams["Huge crew"]}/training-history`);
    expect(huge.status).toBe(413);
    expect(((await huge.json()) as { error: string }).error).toMatch(new RegExp(`more than ${TEAM_ZIP_MAX_PEOPLE} people`));
  }, 60_000);
});
