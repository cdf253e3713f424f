// Languages on the manager's side, through the real route handlers, MariaDB and the local mail
// catcher: the organization's default language for invitations (set by a manager, audited), the
// language of each invitation (its mail, and the account it creates), and reminders written in the
// recipient's language.
// Reference for the Spanish dates: the Unicode CLDR Spanish calendar data (month names "enero" …
// "diciembre"; long dates written "1 de diciembre de 2026"), and for the English ones the CLDR US
// English pattern "December 1, 2026".
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, auditLog, invitation, user } from "@/db/schema";
import { sendDueReminders } from "@/lib/team/reminders";
import { readFileSync } from "node:fs";
import path from "node:path";
import Papa from "papaparse";
import YAML from "yaml";
import { anonymous, linkIn, postJson, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { clientOf, daysFromNow, fixtureOrg, fixturePerson, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";

const MESES = ["enero", "febrero", "marzo", "abril", "mayo", "junio", "julio", "agosto", "septiembre", "octubre", "noviembre", "diciembre"];
const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];
const spanishDate = (d: Date) => `${d.getUTCDate()} de ${MESES[d.getUTCMonth()]} de ${d.getUTCFullYear()}`;
const englishDate = (d: Date) => `${MONTHS[d.getUTCMonth()]} ${d.getUTCDate()}, ${d.getUTCFullYear()}`;

let org: FixtureOrg;
let manager: FixturePerson;
let mgr: Client;

beforeAll(async () => {
  org = await fixtureOrg("Tolliver Ridge Sprinklers", { seats: 20, teams: ["Rough-in crew"] });
  manager = await fixturePerson(org, { name: "Saoirse Penhallow", role: "manager" });
  mgr = await clientOf(manager.id);
});
afterAll(() => pool.end());

describe("the organization's default language for invitations", () => {
  it("starts as English, is changed by a manager (audited) and refuses a language Riser does not have", async () => {
    expect((await (await mgr.fetch("/api/team/language")).json()).language).toBe("en");
    const bad = await postJson(mgr, "/api/team/language", { language: "fr" });
    expect(bad.status).toBe(400);
    expect((bad.json.fieldErrors as Record<string, string[]>).language).toBeDefined();
    const res = await postJson(mgr, "/api/team/language", { language: "es" });
    expect(res.status).toBe(200);
    expect((await (await mgr.fetch("/api/team/language")).json()).language).toBe("es");
    const rows = await db.select().from(auditLog).where(and(eq(auditLog.action, "organization.default-language"), eq(auditLog.targetId, org.id)));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.actorId).toBe(manager.id);
  });
});

describe("an invitation's language", () => {
  it("defaults to the organization's: a Spanish mail, and the account it creates starts in Spanish", async () => {
    const email = uniqueEmail("invitee-es");
    const res = await postJson(mgr, "/api/team/invites", { email, name: "Leocadia Varro", role: "learner", teamId: org.teams["Rough-in crew"] });
    expect(res.status).toBe(201);
    const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    expect(row!.language).toBe("es");
    const mail = await waitForMail(email);
    // Spanish: the expiry date as CLDR writes it in Spanish, none of the English mail's sentences
    expect(mail.text).toContain(spanishDate(row!.expiresAt));
    expect(mail.text).not.toContain(englishDate(row!.expiresAt));
    expect(mail.subject).not.toMatch(/invited/i);
    expect(mail.text).not.toMatch(/\b(the|has invited you|expires on)\b/);
    expect(mail.subject).toContain(org.name);
    expect(mail.text).toContain("Saoirse Penhallow");
    expect(mail.text).toContain("(Rough-in crew)");

    const token = new URL(linkIn(mail.text)).pathname.split("/").pop()!;
    const accepted = await postJson(anonymous(), "/api/invite/accept", { token, name: "Leocadia Varro", password: "joined-in-spanish-42", confirm: "joined-in-spanish-42" });
    expect(accepted.status).toBe(201);
    const [account] = await db.select({ language: user.language }).from(user).where(eq(user.email, email));
    expect(account!.language).toBe("es");
  });

  it("chosen per invitation beats the default: an English mail", async () => {
    const email = uniqueEmail("invitee-en");
    const res = await postJson(mgr, "/api/team/invites", { email, role: "learner", language: "en" });
    expect(res.status).toBe(201);
    const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    expect(row!.language).toBe("en");
    const mail = await waitForMail(email);
    expect(mail.subject).toMatch(/^You are invited to train with Tolliver Ridge/);
    expect(mail.text).toContain(englishDate(row!.expiresAt));
  });

  it("must be one Riser has", async () => {
    const res = await postJson(mgr, "/api/team/invites", { email: uniqueEmail("invitee-xx"), role: "learner", language: "pt" });
    expect(res.status).toBe(400);
    expect((res.json.fieldErrors as Record<string, string[]>).language).toBeDefined();
  });
});

describe("reminders", () => {
  let spanish: FixturePerson;
  let english: FixturePerson;
  const due = daysFromNow(-2);

  beforeAll(async () => {
    spanish = await fixturePerson(org, { name: "Eulalia Brisk" });
    english = await fixturePerson(org, { name: "Torben Quayle" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, spanish.id));
    const base = { organizationId: org.id, createdBy: manager.id, createdAt: new Date(), kind: "module" as const, targetSlug: "freeze-protection", dueAt: due };
    await db.insert(assignment).values([
      { ...base, userId: spanish.id, targetKey: `u:${spanish.id}` },
      { ...base, userId: english.id, targetKey: `u:${english.id}` },
    ]);
  });

  it("go out in each recipient's language", async () => {
    await sendDueReminders();
    const es = await waitForMail(spanish.email);
    const en = await waitForMail(english.email, /^Overdue training: /);
    // the same overdue module, dated as CLDR writes the day in each language
    expect(es.text).toContain(` de ${MESES[due.getUTCMonth()]} de ${due.getUTCFullYear()}`);
    expect(es.text).not.toMatch(/past its due date|was due/);
    expect(es.text).toContain("/modules/freeze-protection\n");
    expect(en.text).toContain(`${MONTHS[due.getUTCMonth()]} ${due.getUTCDate()}, ${due.getUTCFullYear()}`);
    expect(en.text).toContain("This training assigned to you is past its due date:");
    expect(en.text).toContain("/modules/freeze-protection\n");
  });
});

describe("the board CSV", () => {
  // headers in the downloader's language: the Spanish team catalog and the Spanish module title as
  // written (messages/es/team.json, content/es/modules/freeze-protection/module.yaml)
  const esTeam = JSON.parse(readFileSync(path.join(process.cwd(), "messages/es/team.json"), "utf8")) as { csv: Record<string, string> };
  const esTitle = (YAML.parse(readFileSync(path.join(process.cwd(), "content/es/modules/freeze-protection/module.yaml"), "utf8")) as { title: string }).title;
  const header = async (c: Client) => {
    const res = await c.fetch("/api/team/board.csv?module=freeze-protection");
    expect(res.status).toBe(200);
    return Papa.parse<string[]>((await res.text()).replace(/^\uFEFF/, "").trim()).data[0]!;
  };

  it("has English headers for an English manager and Spanish ones for a Spanish manager", async () => {
    expect(await header(mgr)).toEqual(["Name", "E-mail", "Team", "Freeze protection", "Freeze protection: completed", "Freeze protection: score", "Freeze protection: certificate", "Freeze protection: due", "Modules passed", "Overdue", "Next due", "Language"]);
    const spanish = await fixturePerson(org, { name: "Evaristo Quillon", role: "manager" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, spanish.id));
    const c = esTeam.csv;
    expect(await header(await clientOf(spanish.id))).toEqual([
      c.name, c.email, c.team, esTitle,
      `${esTitle}: completado`, `${esTitle}: puntaje`, `${esTitle}: certificado`, `${esTitle}: fecha límite`,
      c.passed, c.overdue, c.nextDue, c.language,
    ]);
    expect(esTitle).not.toBe("Freeze protection");
  });
});
