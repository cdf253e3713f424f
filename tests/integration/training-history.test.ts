// Training history downloads against the running app: the person's own and their manager's, the
// access rules (another organization's manager, unknown people, bad formats), and the organization's
// reporting period changing the totals, with its audit row. PDF text read with poppler's pdftotext.
import { and, eq } from "drizzle-orm";
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditLog } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { postJson, type Client } from "../helpers/http";
import { clientOf, completion, fixtureOrg, fixturePerson, gradedAttempt, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";
import { pdfText } from "../helpers/pdf";

let org: FixtureOrg;
let learner: FixturePerson;
let learnerClient: Client;
let manager: Client;
let otherManager: Client;
const codes: string[] = [];
const serials: string[] = [];

async function issue(person: FixturePerson, moduleSlug: string, at: Date) {
  const attemptId = await gradedAttempt(person, moduleSlug, true, at);
  const [c] = await issueCertificateForCompletion(await completion(person.id, moduleSlug, attemptId, at), { notify: false });
  codes.push(c!.verificationCode);
  serials.push(c!.serial);
}

const csvRows = async (res: Response) => Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, ""), { skipEmptyLines: true }).data;

beforeAll(async () => {
  org = await fixtureOrg(`History Crew ${Date.now()}`);
  learner = await fixturePerson(org, { name: "Odalys Fenwright" });
  learnerClient = await clientOf(learner.id);
  manager = await clientOf((await fixturePerson(org, { name: "History Manager", role: "manager" })).id);
  const other = await fixtureOrg(`Other History Org ${Date.now()}`);
  otherManager = await clientOf((await fixturePerson(other, { name: "Other Manager", role: "manager" })).id);
  // one certificate in June 2025 and one in August 2025: one calendar year, two July-to-June periods
  await issue(learner, "freeze-protection", new Date("2025-06-15T12:00:00Z"));
  await issue(learner, "pipe-and-joining", new Date("2025-08-15T12:00:00Z"));
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
});
