// Adopted editions and local rules per organization: validation (unknown edition, oversized or
// control-character notes), audit rows in the change's transaction, one organization never seeing
// or changing another's, lesson passages and quiz questions for the default edition, and the
// edition named on the certificate.
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, certificate, jurisdiction, localAmendment, quizAttempt } from "@/db/schema";
import { clientOf, createOrganization, createPeople, readAndComplete } from "../helpers/fixtures";
import { postJson, type Client } from "../helpers/http";
import { pdfText } from "../helpers/pdf";
import { answersFor, catalog, itemsOf } from "../helpers/quiz";

const MODULE = "freeze-protection";
const NOTE = "Our purveyor requires a reduced-pressure backflow preventer on every antifreeze loop <script>alert(1)</script>";

let a: { id: string }, b: { id: string };
let mgrA: Client, mgrB: Client, learnerA: Client, learnerB: Client;
let learnerAId = "";

beforeAll(async () => {
  a = await createOrganization("Editions Co A");
  b = await createOrganization("Editions Co B");
  const [ma] = await createPeople(1, { organizationId: a.id, role: "manager", tag: "ed-mgr-a" });
  const [mb] = await createPeople(1, { organizationId: b.id, role: "manager", tag: "ed-mgr-b" });
  const [la] = await createPeople(1, { organizationId: a.id, tag: "ed-learner-a" });
  const [lb] = await createPeople(1, { organizationId: b.id, tag: "ed-learner-b" });
  learnerAId = la!.id;
  [mgrA, mgrB, learnerA, learnerB] = await Promise.all([clientOf(ma!.id), clientOf(mb!.id), clientOf(la!.id), clientOf(lb!.id)]);
});
afterAll(() => pool.end());

const html = async (c: Client, path: string) => {
  const res = await c.fetch(path);
  expect(res.status, path).toBe(200);
  return res.text();
};
/** Whether a page holds a pattern, without printing the whole page on failure. */
const has = (page: string, pattern: string | RegExp) => (typeof pattern === "string" ? page.includes(pattern) : pattern.test(page));

describe("adopted editions", () => {
  let firstId = "";

  it("refuses an unknown edition and missing fields with field errors, and saves nothing", async () => {
    const r = await postJson(mgrA, "/api/team/jurisdictions", { name: "Brackwater County", state: "OR", edition: 2018, ircP2904: false });
    expect(r.status).toBe(400);
    expect((r.json.fieldErrors as Record<string, string[]>).edition?.[0]).toMatch(/2013, 2016, 2019, 2022, 2025/);
    const r2 = await postJson(mgrA, "/api/team/jurisdictions", { edition: 2022 });
    expect(r2.status).toBe(400);
    expect(Object.keys(r2.json.fieldErrors as object).sort()).toEqual(["ircP2904", "name", "state"]);
    expect(await db.select().from(jurisdiction).where(eq(jurisdiction.organizationId, a.id))).toEqual([]);
  });

  it("records jurisdictions with an audit row each; the first is the default, a later default replaces it", async () => {
    const r = await postJson(mgrA, "/api/team/jurisdictions", { name: "Brackwater County", state: "OR", edition: 2016, ircP2904: true });
    expect(r.status, r.text).toBe(201);
    firstId = r.json.id as string;
    const r2 = await postJson(mgrA, "/api/team/jurisdictions", { name: "Tillow Falls", state: "OR", edition: 2022, ircP2904: false, isDefault: true });
    expect(r2.status, r2.text).toBe(201);
    const dup = await postJson(mgrA, "/api/team/jurisdictions", { name: "Tillow Falls", state: "OR", edition: 2019, ircP2904: false });
    expect(dup.status).toBe(409);
    const rows = await db.select().from(jurisdiction).where(eq(jurisdiction.organizationId, a.id));
    expect(rows.map((j) => [j.name, j.edition, j.ircP2904, j.isDefault]).sort()).toEqual([
      ["Brackwater County", 2016, true, false],
      ["Tillow Falls", 2022, false, true],
    ]);
    const audits = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, a.id), eq(auditLog.action, "jurisdiction.create")));
    expect(audits).toHaveLength(2);
    const page = await html(mgrA, "/team/code");
    expect(has(page, "Tillow Falls")).toBe(true);
    expect(has(page, "NFPA 13D 2022 · default")).toBe(true);
  });

  it("another organization's manager can neither change nor remove it, nor write into that organization", async () => {
    expect((await postJson(mgrB, `/api/team/jurisdictions/${firstId}`, { edition: 2025 })).status).toBe(403);
    expect((await postJson(mgrB, `/api/team/jurisdictions/${firstId}`, {}, "DELETE")).status).toBe(403);
    expect((await postJson(mgrB, "/api/team/jurisdictions", { name: "X", state: "OR", edition: 2022, ircP2904: false, org: a.id })).status).toBe(403);
    expect((await postJson(learnerA, "/api/team/jurisdictions", { name: "X", state: "OR", edition: 2022, ircP2904: false })).status).toBe(403);
    const gotB = await mgrB.fetch("/api/team/jurisdictions");
    expect(((await gotB.json()) as { jurisdictions: unknown[] }).jurisdictions).toEqual([]);
    const [row] = await db.select().from(jurisdiction).where(eq(jurisdiction.id, firstId));
    expect(row!.edition).toBe(2016);
  });

  it("shows the default edition's passage first and open, the others one click away", async () => {
    const lesson = await html(learnerA, `/modules/${MODULE}/antifreeze-limits`);
    expect(has(lesson, "Your organization works to NFPA 13D 2022")).toBe(true);
    expect(has(lesson, /data-current="true"[^>]*>[\s\S]*?2022 and 2025: your adopted edition/)).toBe(true);
    expect(has(lesson, /<details[^>]*data-current="false"[^>]*><summary[^>]*>Other edition: NFPA 13D 2013 to 2019/)).toBe(true);
    expect(lesson.indexOf("2022 and 2025: your adopted edition")).toBeLessThan(lesson.indexOf("Other edition: NFPA 13D 2013 to 2019"));
    // organization B set none: every passage shows, labelled, none folded away
    const other = await html(learnerB, `/modules/${MODULE}/antifreeze-limits`);
    expect(has(other, "2025: your adopted edition") || has(other, "2019: your adopted edition")).toBe(false);
    expect(has(other, 'data-current="none-set"')).toBe(true);
  });
});

describe("local rules", () => {
  it("refuses an oversized note, control characters and an unknown topic with a clear 400", async () => {
    const big = await postJson(mgrA, "/api/team/amendments", { topic: "freeze", body: "x".repeat(501) });
    expect(big.status).toBe(400);
    expect((big.json.fieldErrors as Record<string, string[]>).body?.[0]).toMatch(/At most 500/);
    expect((await postJson(mgrA, "/api/team/amendments", { topic: "freeze", body: "bell\u0007 on every loop" })).status).toBe(400);
    expect((await postJson(mgrA, "/api/team/amendments", { topic: "roofing", body: "A rule for a topic Riser does not have" })).status).toBe(400);
    expect((await postJson(mgrA, "/api/team/amendments/roofing", {}, "DELETE")).status).toBe(404);
    // writing into another organization's topics is refused, and nothing is stored there
    const foreign = await postJson(mgrB, "/api/team/amendments", { topic: "freeze", body: "A rule written into someone else's organization", org: a.id });
    expect(foreign.status).toBe(403);
    expect(await db.select().from(localAmendment).where(eq(localAmendment.organizationId, a.id))).toEqual([]);
  });

  it("shows the note, escaped, with author and date, to its own organization only, on lessons and cards of the topic", async () => {
    const draft = await postJson(mgrA, "/api/team/amendments", { topic: "freeze", body: "Backflow preventer on every antifreeze loop (draft)" });
    expect(draft.status, draft.text).toBe(200);
    const r = await postJson(mgrA, "/api/team/amendments", { topic: "freeze", body: NOTE });
    expect(r.status, r.text).toBe(200);
    const [audit] = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, a.id), eq(auditLog.action, "amendment.create")));
    expect(audit!.targetId).toBe("freeze");
    // the rewrite replaces the note (one row) and its audit row keeps both texts
    const [update] = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, a.id), eq(auditLog.action, "amendment.update")));
    expect(update!.details).toMatchObject({ from: "Backflow preventer on every antifreeze loop (draft)", to: NOTE });
    expect(await db.select().from(localAmendment).where(eq(localAmendment.organizationId, a.id))).toHaveLength(1);
    for (const path of ["/reference/antifreeze-systems", `/modules/${MODULE}/antifreeze-limits`]) {
      const mine = await html(learnerA, path);
      expect(mine).toContain("Local rule: Freeze protection");
      expect(mine).toContain('data-testid="local-rule"');
      expect(mine).toContain("reduced-pressure backflow preventer on every antifreeze loop &lt;script&gt;alert(1)&lt;/script&gt;");
      expect(mine).not.toContain("<script>alert(1)</script>");
      expect(mine).toContain("Test ed-mgr-a 1");
      const theirs = await html(learnerB, path);
      // the rule's own box (every page also carries the message catalog, where the words "Local rule" are)
      expect(theirs).not.toContain('data-testid="local-rule"');
      expect(theirs).not.toContain("reduced-pressure backflow preventer on every antifreeze loop");
    }
    // a card on another topic carries no freeze note
    expect(await html(learnerA, "/reference/sidewall-placement")).not.toContain('data-testid="local-rule"');
  });

  it("another organization cannot remove it; its own manager can, audited", async () => {
    expect((await postJson(mgrB, "/api/team/amendments/freeze", {}, "DELETE")).status).toBe(404);
    expect((await postJson(mgrB, `/api/team/amendments/freeze?org=${a.id}`, {}, "DELETE")).status).toBe(403);
    expect(await db.select().from(localAmendment).where(eq(localAmendment.organizationId, a.id))).toHaveLength(1);
    expect((await postJson(mgrA, "/api/team/amendments/freeze", {}, "DELETE")).status).toBe(200);
    expect(await db.select().from(localAmendment).where(eq(localAmendment.organizationId, a.id))).toHaveLength(0);
    expect(await db.select().from(auditLog).where(and(eq(auditLog.organizationId, a.id), eq(auditLog.action, "amendment.remove")))).toHaveLength(1);
  });
});

describe("quiz and certificate follow the default edition", () => {
  it("draws only questions valid for 2016, records the edition, and names it on the certificate", async () => {
    const [tillow] = await db.select().from(jurisdiction).where(and(eq(jurisdiction.organizationId, a.id), eq(jurisdiction.name, "Brackwater County")));
    expect((await postJson(mgrA, `/api/team/jurisdictions/${tillow!.id}`, { isDefault: true })).status).toBe(200);
    const [moved] = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, a.id), eq(auditLog.action, "jurisdiction.update")));
    expect(moved!.details).toMatchObject({ name: "Brackwater County", changes: { isDefault: { from: false, to: true } } });
    expect((await db.select().from(jurisdiction).where(and(eq(jurisdiction.organizationId, a.id), eq(jurisdiction.isDefault, true)))).map((j) => j.name)).toEqual(["Brackwater County"]);
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    await readAndComplete(learnerA, learnerAId, MODULE, mod.lessons.map((l) => l.slug));
    const start = await postJson(learnerA, "/api/quiz/attempts", { module: MODULE });
    expect(start.status, start.text).toBeLessThan(300);
    const id = start.json.id as string;
    const [attempt] = await db.select().from(quizAttempt).where(eq(quizAttempt.id, id));
    expect(attempt!.edition).toBe(2016);
    const allowed = new Set(mod.questions.filter((q) => !q.editions || q.editions.includes(2016)).map((q) => q.id));
    const items = await itemsOf(id);
    expect(items.length).toBe(mod.meta.quiz.questionsPerAttempt);
    expect(items.filter((i) => !allowed.has(i.body.id)).map((i) => i.body.id)).toEqual([]);
    const done = await postJson(learnerA, `/api/quiz/attempts/${id}/submit`, { answers: await answersFor(id) });
    expect(done.json.passed, done.text).toBe(true);
    const [cert] = await db.select().from(certificate).where(and(eq(certificate.userId, learnerAId), eq(certificate.kind, "module")));
    expect(cert!.edition).toBe(2016);
    const pdf = await learnerA.fetch(`/api/certificates/${cert!.id}/pdf`);
    expect(pdf.status).toBe(200);
    expect(pdfText(new Uint8Array(await pdf.arrayBuffer())).replace(/\s+/g, " ")).toContain("Taught to NFPA 13D, 2016 edition");
  });
});

describe("removing a jurisdiction", () => {
  it("hands the default to the one recorded first, audited; the last default cannot be switched off", async () => {
    const first = await postJson(mgrB, "/api/team/jurisdictions", { name: "Orrin Hollow", state: "WA", edition: 2019, ircP2904: false });
    const second = await postJson(mgrB, "/api/team/jurisdictions", { name: "Pell Crossing", state: "WA", edition: 2025, ircP2904: true, isDefault: true });
    expect([first.status, second.status]).toEqual([201, 201]);
    const off = await postJson(mgrB, `/api/team/jurisdictions/${second.json.id as string}`, { isDefault: false });
    expect(off.status).toBe(400);
    expect((off.json.fieldErrors as Record<string, string[]>).isDefault?.[0]).toMatch(/choose another as default/);
    expect((await postJson(mgrB, `/api/team/jurisdictions/${second.json.id as string}`, {}, "DELETE")).status).toBe(200);
    const rows = await db.select().from(jurisdiction).where(eq(jurisdiction.organizationId, b.id));
    expect(rows.map((j) => [j.name, j.isDefault])).toEqual([["Orrin Hollow", true]]);
    const [removed] = await db.select().from(auditLog).where(and(eq(auditLog.organizationId, b.id), eq(auditLog.action, "jurisdiction.remove")));
    expect(removed!.details).toMatchObject({ name: "Pell Crossing", edition: 2025, wasDefault: true });
  });
});
