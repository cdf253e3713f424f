// The team board through GET /api/team/board: a fresh organization whose people each stand in
// one status for "Freeze protection" (rows built straight in the database), pagination, filters
// and sorting, inheritance of team assignments, the person page, the exports with formula cells
// neutralised, and isolation: another organization's manager gets 403 and never sees a row.
import Papa from "papaparse";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { postJson, signIn, type Client, getJson } from "../helpers/http";
import { clientOf, completedWithCertificate, daysFromNow, fixtureOrg, fixturePerson, gradedAttempt, lessonsDone, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";

const FORMULA_TEAM = '=HYPERLINK("http://evil.example","click")'; // a team name a spreadsheet would run
const MODULE = "freeze-protection"; // 4 lessons, valid 24 months (content/modules/freeze-protection/module.yaml)
type Cell = { status: string; dueAt: string | null; lessonsDone: number; lessonsTotal: number };
type Row = { id: string; name: string; team: string | null; passed: number; overdue: number; nextDue: string | null; cells: Record<string, Cell> };
type Page = { page: number; pageSize: number; total: number; pages: number; rows: Row[]; modules: { slug: string }[] };

let org: FixtureOrg;
let mgr: Client;
const P: Record<string, FixturePerson> = {};
let assignmentId = 0;

beforeAll(async () => {
  // Names sort after "Dario Feltham" so that other suites' first pages of people stay as they expect.
  org = await fixtureOrg("Board Fixture Sprinklers", { teams: ["Attic crew", "Basement crew", FORMULA_TEAM] });
  const attic = org.teams["Attic crew"]!;
  const basement = org.teams["Basement crew"]!;
  const manager = await fixturePerson(org, { name: "Zz Manager Fixture", role: "manager" });
  mgr = await clientOf(manager.id);
  const mk = async (key: string, name: string, teamId: string | null) => (P[key] = await fixturePerson(org, { name, teamId }));
  await mk("notStarted", "Nadine Notstarted", attic);
  await mk("inProgress", "Ivo Inprogress", attic);
  await mk("passed", "Paloma Passed", attic);
  await mk("failed", "Fabian Failed", basement);
  await mk("expiring", "Elodie Expiring", basement);
  await mk("expired", "Florin Expired", basement);
  await mk("overdue", "Greta Overdue", null);
  await mk("joiner", "Hugo Joiner", null);
  await mk("formula", "Rupert Formula", org.teams[FORMULA_TEAM]!);

  await lessonsDone(P.inProgress!, MODULE, 2);
  await lessonsDone(P.passed!, MODULE, 4);
  await completedWithCertificate(P.passed!, MODULE, { completedAt: daysFromNow(-20), expiresAt: daysFromNow(700) });
  await lessonsDone(P.failed!, MODULE, 4);
  await gradedAttempt(P.failed!, MODULE, false);
  await completedWithCertificate(P.expiring!, MODULE, { completedAt: daysFromNow(-700), expiresAt: daysFromNow(10) });
  await completedWithCertificate(P.expired!, MODULE, { completedAt: daysFromNow(-800), expiresAt: daysFromNow(-30), holderName: "@SUM(1+1)" });
  await lessonsDone(P.overdue!, MODULE, 1);
  await db.insert(assignment).values({ organizationId: org.id, kind: "module", targetSlug: MODULE, userId: P.overdue!.id, targetKey: `u:${P.overdue!.id}`, dueAt: daysFromNow(-2), createdBy: manager.id, createdAt: new Date() });
});
afterAll(() => pool.end());

const board = async (qs: string, client = mgr) => getJson<Page>(client, `/api/team/board?${qs}`);
const names = (p: Page) => p.rows.map((r) => r.name);

describe("board statuses", () => {
  it("computes one status per person for the module", async () => {
    const { status, body } = await board(`module=${MODULE}&pageSize=50`);
    expect(status).toBe(200);
    expect(body.modules.map((m) => m.slug)).toEqual([MODULE]);
    const of = (p: FixturePerson) => body.rows.find((r) => r.id === p.id)!.cells[MODULE]!;
    expect(of(P.notStarted!).status).toBe("not_started");
    expect(of(P.inProgress!)).toMatchObject({ status: "in_progress", lessonsDone: 2, lessonsTotal: 4 });
    expect(of(P.passed!).status).toBe("passed");
    expect(of(P.failed!).status).toBe("failed");
    expect(of(P.expiring!).status).toBe("expiring");
    expect(of(P.expired!).status).toBe("expired");
    expect(of(P.overdue!)).toMatchObject({ status: "overdue" });
    expect(of(P.overdue!).dueAt!.slice(0, 10)).toBe(daysFromNow(-2).toISOString().slice(0, 10));
  });

  it("shows all modules by default, in teaching order", async () => {
    const { body } = await board("pageSize=5");
    expect(body.modules[0]!.slug).toBe("how-systems-work");
    expect(body.modules).toHaveLength(10); // content/modules: ten module folders
    expect(Object.keys(body.rows[0]!.cells)).toHaveLength(10);
  });
});

describe("pagination, filters and sorting", () => {
  it("pages through everyone once, in name order", async () => {
    const first = (await board("pageSize=4")).body;
    expect(first.total).toBe(10); // nine fixture people and the manager
    expect(first.pages).toBe(3);
    const seen: string[] = [];
    for (let page = 1; page <= 3; page++) seen.push(...names((await board(`pageSize=4&page=${page}`)).body));
    expect(seen).toHaveLength(10);
    expect(new Set(seen).size).toBe(10);
    expect(seen).toEqual([...seen].sort((a, b) => a.localeCompare(b)));
    const beyond = (await board("pageSize=4&page=9")).body;
    expect(beyond.rows).toEqual([]);
    expect(beyond.total).toBe(10);
  });

  it("filters by team, status, module, due date and name", async () => {
    expect(names((await board(`team=${org.teams["Attic crew"]}`)).body).sort()).toEqual(["Ivo Inprogress", "Nadine Notstarted", "Paloma Passed"]);
    expect(names((await board(`status=failed&module=${MODULE}`)).body)).toEqual(["Fabian Failed"]);
    expect(names((await board(`status=expiring`)).body)).toEqual(["Elodie Expiring"]);
    expect(names((await board(`status=overdue&team=${org.teams["Basement crew"]}`)).body)).toEqual([]);
    expect(names((await board(`dueBefore=${daysFromNow(0).toISOString().slice(0, 10)}`)).body)).toEqual(["Greta Overdue"]);
    expect(names((await board("q=paloma")).body)).toEqual(["Paloma Passed"]);
    const bad = await board("status=sleeping");
    expect(bad.status).toBe(400);
  });

  it("sorts by progress on the server", async () => {
    const top = (await board("sort=progress&pageSize=3")).body;
    expect(top.total).toBe(10);
    expect(top.rows[0]!.passed).toBeGreaterThanOrEqual(top.rows[1]!.passed);
    expect(names(top).slice(0, 2).sort()).toEqual(["Elodie Expiring", "Paloma Passed"]); // the only ones passed
  });
});

describe("team assignments are inherited at read time", () => {
  it("someone who joins the team later gets its due date on the board and on /learn", async () => {
    const due = daysFromNow(12).toISOString().slice(0, 10);
    const res = await postJson(mgr, "/api/team/assignments", { kind: "path", slug: "new-installer", teamIds: [org.teams["Attic crew"]], dueAt: due });
    expect(res.status).toBe(201);
    let row = (await board("q=Hugo")).body.rows[0]!;
    expect(row.cells["freeze-protection"]!.dueAt).toBeNull();
    await db.update(user).set({ teamId: org.teams["Attic crew"] }).where(eq(user.id, P.joiner!.id));
    row = (await board("q=Hugo")).body.rows[0]!;
    expect(row.cells["freeze-protection"]!.dueAt!.slice(0, 10)).toBe(due); // New installer includes Freeze protection (content/paths.yaml)
    expect(row.cells["hydraulics-and-permits"]!.dueAt).toBeNull(); // not in New installer
    const learn = await (await clientOf(P.joiner!.id)).fetch("/learn");
    const html = await learn.text();
    expect(html).toContain("New installer");
    expect(html).toContain("for your team");
    assignmentId = (await db.select({ id: assignment.id }).from(assignment).where(eq(assignment.teamId, org.teams["Attic crew"]!)))[0]!.id;
  });

  it("lists assigned work on /learn ordered by due date", async () => {
    const later = daysFromNow(40).toISOString().slice(0, 10);
    const sooner = daysFromNow(3).toISOString().slice(0, 10);
    await postJson(mgr, "/api/team/assignments", { kind: "module", slug: "working-with-trades", userIds: [P.notStarted!.id], dueAt: later });
    await postJson(mgr, "/api/team/assignments", { kind: "module", slug: "sprinklers-and-coverage", userIds: [P.notStarted!.id], dueAt: sooner });
    const page = await (await (await clientOf(P.notStarted!.id)).fetch("/learn")).text();
    const html = page.slice(page.indexOf("Assigned to you"));
    const a = html.indexOf("Sprinklers and coverage");
    const b = html.indexOf("New installer"); // team path, due in 12 days
    const c = html.indexOf("Working with the other trades");
    expect(a).toBeGreaterThan(0);
    expect(a).toBeLessThan(b);
    expect(b).toBeLessThan(c);
  });

  it("refuses a due date in the past and people of another organization", async () => {
    const past = await postJson(mgr, "/api/team/assignments", { kind: "module", slug: MODULE, teamIds: [org.teams["Attic crew"]], dueAt: "2020-01-01" });
    expect(past.status).toBe(400);
    expect((past.json.fieldErrors as Record<string, string[]>).dueAt?.[0]).toMatch(/today or a later date/);
    const dario = (await db.select({ id: user.id }).from(user).where(eq(user.email, "dario@quillmoor.example")))[0]!;
    const other = await postJson(mgr, "/api/team/assignments", { kind: "module", slug: MODULE, userIds: [dario.id], dueAt: daysFromNow(5).toISOString().slice(0, 10) });
    expect(other.status).toBe(400);
  });
});

describe("person page", () => {
  it("shows attempts, lessons, certificates and assignments to the manager; unknown is 404", async () => {
    const res = await mgr.fetch(`/team/people/${P.expired!.id}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain("Florin Expired");
    expect(html).toContain("Quiz attempts");
    expect(html).toMatch(/RSR-\d{4}-\d{6}/);
    expect(html).toContain("Expired");
    expect((await mgr.fetch("/team/people/00000000-0000-4000-8000-000000000000")).status).toBe(404);
  });
});

describe("exports", () => {
  it("board.csv holds the filtered board with formula cells neutralised", async () => {
    const res = await mgr.fetch(`/api/team/board.csv?module=${MODULE}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const text = (await res.text()).replace(/^\uFEFF/, "");
    const rows = Papa.parse<string[]>(text.trim()).data;
    expect(rows[0]).toEqual([
      "Name",
      "E-mail",
      "Team",
      "Freeze protection",
      "Freeze protection: completed",
      "Freeze protection: score",
      "Freeze protection: certificate",
      "Freeze protection: due",
      "Modules passed",
      "Overdue",
      "Next due",
      "Language",
    ]);
    // Per cell: completion date, score, certificate serial and due date in their own columns.
    const passedRow = rows.find((r) => r[0] === "Paloma Passed")!;
    expect(passedRow[4]).toBe(daysFromNow(-20).toISOString().slice(0, 10));
    expect(passedRow[5]).toBe("90%"); // the fixture's passing attempt scores 90
    expect(passedRow[6]).toMatch(/^RSR-\d{4}-\d{6}$/);
    expect(passedRow[7]).toBe("");
    expect(rows.find((r) => r[0] === "Greta Overdue")![7]).toBe(daysFromNow(-2).toISOString().slice(0, 10));
    expect(rows).toHaveLength(11);
    const evil = rows.find((r) => r[0] === "Rupert Formula")!;
    expect(evil[2]).toBe(`'=HYPERLINK("http://evil.example","click")`);
    expect(text).toContain(`"'=HYPERLINK(""http://evil.example"",""click"")"`); // RFC 4180 quoting after the prefix
    expect(rows.find((r) => r[0] === "Greta Overdue")![3]).toMatch(/^Overdue \(due \d{4}-\d{2}-\d{2}\)$/);
    const filtered = (await (await mgr.fetch(`/api/team/board.csv?status=expired`)).text()).trim().split("\r\n");
    expect(filtered).toHaveLength(2);
    expect(filtered[1]).toMatch(/^Florin Expired,/);
  });

  it("certificates.csv lists the organization's certificates with formula cells neutralised", async () => {
    const res = await mgr.fetch("/api/team/certificates.csv");
    expect(res.status).toBe(200);
    const rows = Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, "").trim()).data;
    expect(rows[0]).toEqual(["Serial", "Holder", "E-mail", "Team", "Kind", "Module or path", "CE hours", "Issued", "Expires", "Status"]);
    expect(rows.slice(1).map((r) => r[1]).sort()).toEqual(["'@SUM(1+1)", "Elodie Expiring", "Paloma Passed"]);
    expect(rows.find((r) => r[1] === "Elodie Expiring")![9]).toBe("Valid, expiring soon");
    expect(rows.find((r) => r[1] === "'@SUM(1+1)")![9]).toBe("Expired");
  });
});

describe("isolation between organizations", () => {
  it("another organization's manager gets 403 and sees no row of this one anywhere", async () => {
    const hollis = await signIn(demoByRole("manager", "larkhaven").email);
    const fixtureNames = Object.values(P).map((p) => p.name);
    const leaks = (text: string) => fixtureNames.filter((n) => text.includes(n.replace(/"/g, '""')) || text.includes(n));
    for (const path of [`/api/team/board?org=${org.id}`, `/api/team/board.csv?org=${org.id}`, `/api/team/certificates.csv?org=${org.id}`, `/api/team/summary?org=${org.id}`, `/api/team/people?org=${org.id}&q=a`]) {
      const res = await hollis.fetch(path);
      expect(res.status, path).toBe(403);
      expect(leaks(await res.text()), path).toEqual([]);
    }
    for (const path of [`/team/people/${P.passed!.id}`, `/team?org=${org.id}`]) {
      const res = await hollis.fetch(path);
      expect(res.status, path).toBe(403);
      expect(leaks(await res.text()), path).toEqual([]);
    }
    for (const path of ["/api/team/board?pageSize=200", "/api/team/board?pageSize=200&status=overdue", "/api/team/board.csv", "/api/team/certificates.csv", "/api/team/summary", "/api/team/people?q=e", "/team", "/team/assign", "/team/invite"]) {
      const res = await hollis.fetch(path);
      expect(res.status, path).toBe(200);
      const text = await res.text();
      expect(leaks(text), path).toEqual([]);
      expect(text.includes(org.name), path).toBe(false);
    }
    const del = await postJson(hollis, `/api/team/assignments/${assignmentId}`, {}, "DELETE");
    expect(del.status).toBe(403);
    expect(await db.select().from(assignment).where(eq(assignment.id, assignmentId))).toHaveLength(1);
    const assign = await postJson(hollis, "/api/team/assignments", { kind: "module", slug: MODULE, userIds: [P.passed!.id], dueAt: daysFromNow(3).toISOString().slice(0, 10) });
    expect(assign.status).toBe(400);
  });

  it("an admin may look at this organization with ?org=", async () => {
    const admin = await signIn(demoByRole("admin").email);
    const { status, body } = await board(`org=${org.id}&pageSize=50`, admin);
    expect(status).toBe(200);
    expect(body.total).toBe(10);
  });
});
