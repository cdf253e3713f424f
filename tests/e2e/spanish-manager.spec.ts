// A training manager who reads Spanish, in a real browser: the header's switch turns the team pages
// Spanish (<html lang="es-US">, BCP 47 tag for US Spanish), the board names each person's language
// (db/demo.ts: Odette Brannock reads Spanish, the rest of the South crew English), an invitation sent
// in Spanish arrives in Spanish (the local mail catcher; dates as the Unicode CLDR Spanish calendar
// writes them, "1 de diciembre de 2026"), and axe (WCAG 2.2 AA tags) finds no violations on the
// Spanish pages. The wording the pages must show is the Spanish catalog's (messages/es/team.json),
// which the test reads and checks differs from the English one.
import { readFileSync } from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { expect, test } from "@playwright/test";
import { hashPassword } from "better-auth/crypto";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../db/demo";
import { uniqueEmail, waitForMail } from "../helpers/http";
import { axeProblems } from "./a11y-checks";
import { signInAs } from "./helpers";

type Tree = { [k: string]: string | Tree };
const catalog = (locale: string) => JSON.parse(readFileSync(path.resolve(import.meta.dirname, `../../messages/${locale}/team.json`), "utf8")) as Tree;
const pick = (tree: Tree, key: string) => key.split(".").reduce<Tree | string>((t, k) => (t as Tree)[k]!, tree) as string;
const es = (key: string) => pick(catalog("es"), key);
const en = (key: string) => pick(catalog("en"), key);
const MESES = ["enero", "febrero", "marzo", "abril", "mayo", "junio", "julio", "agosto", "septiembre", "octubre", "noviembre", "diciembre"];

/** A manager of the demo contractor of this test's own (so the demo manager's language stays English for the other tests). */
async function throwAwayManager(): Promise<string> {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const email = `e2e-gerente-${Date.now().toString(36)}-${randomUUID().slice(0, 6)}@test.example`;
    const id = randomUUID();
    const [rows] = await conn.query("select organization_id from user where email = 'maren@quillmoor.example'");
    const org = (rows as { organization_id: string }[])[0]!.organization_id;
    await conn.query("insert into user (id, name, email, email_verified, role, organization_id, created_at, updated_at) values (?, 'Test Gerente', ?, 1, 'manager', ?, now(), now())", [id, email, org]);
    await conn.query("insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at) values (?, ?, 'credential', ?, ?, now(), now())", [randomUUID(), id, id, await hashPassword(DEMO_PASSWORD)]);
    // earlier tests may have filled the demo's seats (members and open invitations both count): leave
    // room for this test's invitation
    await conn.query(
      `update organization set seats = greatest(seats,
         (select count(*) from user where organization_id = ?)
         + (select count(*) from invitation where organization_id = ? and accepted_at is null and revoked_at is null and expires_at > now(3)) + 2)
       where id = ?`,
      [org, org, org],
    );
    return email;
  } finally {
    await conn.end();
  }
}

test("a manager switches to Español: the board, its filters and each person's language in Spanish; an invitation in Spanish; no axe violations", async ({ page }) => {
  for (const key of ["board.title", "board.col.language", "board.clear", "invite.send"]) expect(es(key), key).not.toBe(en(key));
  await signInAs(page, await throwAwayManager());
  await page.getByTestId("language-switch").getByRole("button", { name: "Español" }).click();
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");

  await page.goto("/team");
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
  await expect(page.getByRole("heading", { level: 1, name: es("board.title") })).toBeVisible();
  await expect(page.getByRole("heading", { name: es("board.heading") })).toBeVisible();
  await expect(page.getByRole("search", { name: es("board.filterLabel") })).toBeVisible();
  await expect(page.getByLabel(es("invite.team"), { exact: true })).toBeVisible();
  await expect(page.getByLabel(es("board.status"), { exact: true })).toBeVisible();
  await expect(page.getByRole("button", { name: es("board.clear") })).toBeVisible();

  const table = page.getByRole("region", { name: es("board.tableLabel") });
  await expect(table.getByRole("columnheader", { name: es("board.col.language") })).toBeVisible();
  // the language column in text (not colour alone), each language named in itself
  const spanishReaders = DEMO_PEOPLE.filter((p) => p.org === "quillmoor" && p.language === "es");
  expect(spanishReaders.length).toBeGreaterThan(0);
  await page.getByLabel(es("invite.team"), { exact: true }).selectOption({ label: "South crew" });
  for (const p of spanishReaders) await expect(table.locator(`tr[data-person="${p.name}"]`).getByTestId("person-language")).toHaveText("Español");
  await expect(table.locator('tr[data-person="Wendell Ashcombe"]').getByTestId("person-language")).toHaveText("English");
  const totals = page.getByRole("region", { name: es("summary.tableLabel") });
  await expect(totals).toBeVisible();
  // the demo's manager belongs to no team: the totals name that group in Spanish too
  await expect(totals.getByRole("rowheader", { name: es("noTeam"), exact: true })).toBeVisible();
  expect(await axeProblems(page, "/team (es)")).toEqual([]);

  await page.goto("/team/invite");
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
  const form = page.getByRole("form", { name: es("invite.formLabel") });
  const email = uniqueEmail("invitado-es");
  await form.getByLabel(es("invite.email")).fill(email);
  await form.getByLabel(es("invite.language"), { exact: true }).selectOption("es");
  await form.getByRole("button", { name: es("invite.send") }).click();
  await expect(form.getByRole("status").filter({ hasText: email })).toBeVisible();
  expect(await axeProblems(page, "/team/invite (es)")).toEqual([]);

  const mail = await waitForMail(email);
  const expires = new Date(Date.now() + 7 * 86_400_000);
  // the link's last day (7 days on; a run across midnight UTC may land on the next day)
  const days = [expires, new Date(expires.getTime() + 86_400_000)].map((d) => `${d.getUTCDate()} de ${MESES[d.getUTCMonth()]} de ${d.getUTCFullYear()}`);
  expect(days.some((d) => mail.text.includes(d)), mail.text).toBe(true);
  expect(mail.subject).toContain("Quillmoor Fire Protection");
  expect(mail.subject).not.toMatch(/invited/i);
  expect(mail.text).not.toMatch(/has invited you|expires on/);
});
