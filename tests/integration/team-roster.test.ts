// Bulk invitations from a CSV file: the preview names each row's problem (fixture
// tests/fixtures/roster-problems.csv has one row of every kind), writes nothing, and the import
// writes exactly the valid rows in one go; refusals for files that are not CSV, too large or not
// UTF-8; a 2,000-row file imports.
import { readFileSync } from "node:fs";
import path from "node:path";
import { and, count, eq, inArray, isNull } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, invitation, organization, user } from "@/db/schema";
import { mailsTo, waitForMail, type Client, uploadRoster } from "../helpers/http";
import { clientOf, fixtureOrg, fixturePerson, type FixtureOrg } from "../helpers/fixtures";

const fixture = readFileSync(path.resolve("tests/fixtures/roster-problems.csv"));
let org: FixtureOrg;
let mgr: Client;

type Row = { line: number; email: string; problems: string[]; notes: string[] };

const FIXED = ["fenna.member@roster-fixture.example", "gil.elsewhere@roster-fixture.example"];

beforeAll(async () => {
  // The fixture's fixed addresses: remove what an earlier run against the same database left.
  await db.delete(user).where(inArray(user.email, FIXED));
  await db.delete(invitation).where(inArray(invitation.email, ["aldo.pinnery@roster-fixture.example", "bea.quarrow@roster-fixture.example"]));
  // seats 4: the manager and Fenna are members, so two invitations fit.
  org = await fixtureOrg("Roster Test Sprinklers", { seats: 4, teams: ["Rough-in crew", "Trim crew"] });
  const manager = await fixturePerson(org, { name: "Tamsin Orle", role: "manager" });
  await fixturePerson(org, { name: "Fenna Member", email: FIXED[0], teamId: org.teams["Trim crew"] });
  const other = await fixtureOrg("Another Contractor");
  await fixturePerson(other, { name: "Gil Elsewhere", email: FIXED[1] });
  mgr = await clientOf(manager.id);
});
afterAll(() => pool.end());

const invitesOf = async (orgId: string) => (await db.select({ n: count() }).from(invitation).where(eq(invitation.organizationId, orgId)))[0]!.n;
const auditsOf = async (orgId: string) => (await db.select({ n: count() }).from(auditLog).where(and(eq(auditLog.organizationId, orgId), eq(auditLog.action, "invite.send"))))[0]!.n;

describe("CSV roster", () => {
  it("previews every row with the right problem and writes nothing", async () => {
    const res = await uploadRoster(mgr, "/api/team/invites/preview", fixture, "roster-problems.csv");
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ total: 10, valid: 2, invalid: 8, seats: { seats: 4, used: 2 } });
    const by = Object.fromEntries((res.json.rows as Row[]).map((r) => [r.line, r.problems]));
    expect(by[2]).toEqual([]);
    expect(by[3]).toEqual([]); // role and team match without case
    expect(by[4]).toEqual(["Bad e-mail address: “cyr.vantle(at)roster-fixture.example”"]);
    expect(by[5]).toEqual(["Unknown role “foreman”: use learner, sales or manager"]);
    expect(by[6]).toEqual(["Unknown team “Attic crew”: teams are Rough-in crew, Trim crew"]);
    expect(by[7]).toEqual(["Duplicate in file: the same e-mail is on line 2"]);
    expect(by[8]).toEqual([`Already a member of ${org.name}: nothing will be sent`]);
    // An address with an account in another organization gets the answer an unknown address gets
    // (here: over the seat count, like line 11), never "has an account elsewhere".
    expect(by[9]).toEqual(["Over the seat count: your organization has 4 seats and all are taken; buy more on the billing page"]);
    expect(by[10]).toEqual(["E-mail is missing"]);
    expect(by[11]).toEqual(["Over the seat count: your organization has 4 seats and all are taken; buy more on the billing page"]);
    // Nothing written before the manager confirms.
    expect(await invitesOf(org.id)).toBe(0);
    expect(await auditsOf(org.id)).toBe(0);
    expect(await mailsTo("aldo.pinnery@roster-fixture.example")).toEqual([]);

    // A changed file is not imported on the strength of another file's preview.
    const tampered = await uploadRoster(mgr, "/api/team/invites/import", Buffer.concat([fixture, Buffer.from("zed@roster-fixture.example,,,\r\n")]), "roster-problems.csv", {
      fileHash: res.json.fileHash as string,
    });
    expect(tampered.status).toBe(409);
    expect(await invitesOf(org.id)).toBe(0);

    // Confirm: exactly the two valid rows, audited, mailed.
    const imported = await uploadRoster(mgr, "/api/team/invites/import", fixture, "roster-problems.csv", { fileHash: res.json.fileHash as string });
    expect(imported.status).toBe(201);
    expect(imported.json).toMatchObject({ imported: 2, skipped: 8 });
    const rows = await db.select().from(invitation).where(eq(invitation.organizationId, org.id));
    expect(rows.map((r) => [r.email, r.role, r.teamId]).sort()).toEqual([
      ["aldo.pinnery@roster-fixture.example", "learner", org.teams["Rough-in crew"]],
      ["bea.quarrow@roster-fixture.example", "manager", org.teams["Trim crew"]],
    ]);
    expect(await auditsOf(org.id)).toBe(2);
    await waitForMail("aldo.pinnery@roster-fixture.example", /invited to train/);
    await waitForMail("bea.quarrow@roster-fixture.example", /invited to train/);
    expect(await mailsTo("hale.upton@roster-fixture.example")).toEqual([]);
  });

  it("refuses files that are not CSV, too large or not UTF-8, with the reason", async () => {
    const xlsx = await uploadRoster(mgr, "/api/team/invites/preview", Uint8Array.from([0x50, 0x4b, 3, 4, 20, 0, 6, 0]), "roster.xlsx");
    expect(xlsx.status).toBe(400);
    expect(xlsx.json.error).toMatch(/spreadsheet workbook, not a CSV file/);
    // the same refusal as a team-catalog key, so the page shows it in the manager's language
    expect(xlsx.json.errorKey).toBe("bulk.file.workbook");
    const big = await uploadRoster(mgr, "/api/team/invites/preview", new Uint8Array(1024 * 1024 + 10).fill(0x61), "big.csv");
    expect(big.status).toBe(413);
    expect(big.json.error).toMatch(/the limit is 1 MB/);
    // "Zoë" saved as Windows-1252: ë is the lone byte 0xEB, invalid in UTF-8.
    const latin = Buffer.concat([Buffer.from("email,name\r\nzoe@roster-fixture.example,Zo"), Buffer.from([0xeb]), Buffer.from("\r\n")]);
    const enc = await uploadRoster(mgr, "/api/team/invites/preview", latin, "latin1.csv");
    expect(enc.status).toBe(400);
    expect(enc.json.error).toMatch(/not UTF-8/);
    const noHeader = await uploadRoster(mgr, "/api/team/invites/preview", "name,team\r\nA,B\r\n", "r.csv");
    expect(noHeader.status).toBe(400);
    expect(noHeader.json.error).toMatch(/first row must name the columns/);
    expect(noHeader.json).toMatchObject({ errorKey: "bulk.file.noHeader", errorValues: { columns: "email,name,role,team" } });
    expect(await invitesOf(org.id)).toBe(2);
  });

  it("imports a 2,000-row file in one transaction, and refuses 2,001 rows", async () => {
    const big = await fixtureOrg("Large Roster Sprinklers", { seats: 3, teams: ["Crew A", "Crew B"] });
    const boss = await fixturePerson(big, { name: "Quentin Harl", role: "manager" });
    const client = await clientOf(boss.id);
    // The seat limit would stop this file: raise the test organization's seats directly.
    await db.update(organization).set({ seats: 2500 }).where(eq(organization.id, big.id));
    const stamp = Date.now().toString(36);
    const lines = Array.from({ length: 2000 }, (_, i) => `p${i}-${stamp}@bulk-fixture.example,Person ${i},${i % 10 === 0 ? "sales" : "learner"},${i % 2 ? "Crew A" : "crew b"}`);
    const csv = `email,name,role,team\r\n${lines.join("\r\n")}\r\n`;
    const preview = await uploadRoster(client, "/api/team/invites/preview", csv, "everyone.csv");
    expect(preview.status).toBe(200);
    expect(preview.json).toMatchObject({ total: 2000, valid: 2000, invalid: 0 });
    expect(await invitesOf(big.id)).toBe(0);
    const t0 = Date.now();
    const imported = await uploadRoster(client, "/api/team/invites/import", csv, "everyone.csv", { fileHash: preview.json.fileHash as string });
    expect(imported.status).toBe(201);
    expect(imported.json.imported).toBe(2000);
    console.log(`[roster] 2,000-row import answered in ${Date.now() - t0} ms`);
    const open = await db.select({ n: count() }).from(invitation).where(and(eq(invitation.organizationId, big.id), isNull(invitation.revokedAt)));
    expect(open[0]!.n).toBe(2000);
    expect(await auditsOf(big.id)).toBe(2000);

    const tooMany = `email\r\n${Array.from({ length: 2001 }, (_, i) => `q${i}@bulk-fixture.example`).join("\r\n")}\r\n`;
    const refused = await uploadRoster(client, "/api/team/invites/preview", tooMany, "too-many.csv");
    expect(refused.status).toBe(400);
    expect(refused.json.error).toBe("The file has 2,001 rows; the limit is 2,000 per upload. Split it into smaller files.");
  });

  it("serves a template with the organization's team names", async () => {
    const res = await mgr.fetch("/api/team/invites/template.csv");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/csv");
    const text = (await res.text()).replace(/^\uFEFF/, "");
    expect(text.split("\r\n")[0]).toBe("email,name,role,team");
    expect(text).toMatch(/Rough-in crew/);
  });
});
