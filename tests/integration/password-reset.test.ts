// Password reset by mail: request → mail from the local catcher → the link → new password works,
// the old one no longer does; an unknown address gets the same answer (no account probing).
import { readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { APP, fetchFrom, freshIp, linkIn, mailsTo, postJson, anonymous, signIn, uniqueEmail, waitForMail } from "../helpers/http";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

afterAll(() => pool.end());

describe("password reset", () => {
  it("resets through the mailed link", async () => {
    const org = await createOrganization("Reset Test Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "reset" });
    const req = await postJson(anonymous(), "/api/auth/request-password-reset", { email: p!.email, redirectTo: "/reset-password" });
    expect(req.status).toBe(200);
    const mail = await waitForMail(p!.email, /reset/i);
    const link = linkIn(mail.text);
    const hop = await fetchFrom(freshIp(), link, { redirect: "manual" });
    expect([302, 303, 307]).toContain(hop.status);
    const location = new URL(hop.headers.get("location")!, APP);
    expect(location.pathname).toBe("/reset-password");
    const token = location.searchParams.get("token");
    expect(token).toBeTruthy();

    const page = await fetch(location);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Choose a new password");

    const reset = await postJson(anonymous(), "/api/auth/reset-password", { newPassword: "a-brand-new-pass-9", token });
    expect(reset.status).toBe(200);
    await expect(signIn(p!.email, TEST_PASSWORD)).rejects.toThrow(/401/);
    const client = await signIn(p!.email, "a-brand-new-pass-9");
    expect((await (await client.fetch("/api/auth/get-session")).json()).user.email).toBe(p!.email);

    const reused = await postJson(anonymous(), "/api/auth/reset-password", { newPassword: "another-pass-123", token });
    expect(reused.status).toBe(400);
  });

  it("answers an unknown address the same way and sends nothing", async () => {
    const email = "nobody-here@test.example";
    const res = await postJson(anonymous(), "/api/auth/request-password-reset", { email, redirectTo: "/reset-password" });
    expect(res.status).toBe(200);
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailsTo(email)).toEqual([]);
  });
});

// The Spanish mail catalog as written (messages/es/mail.json): a Spanish reader's mail carries its
// subject and sentences, with the link and the addresses unchanged.
const esMail = JSON.parse(readFileSync(path.join(process.cwd(), "messages/es/mail.json"), "utf8")) as { auth: Record<"reset" | "changeEmail" | "changeNotice", { subject: string; body: string }> };
const firstLine = (body: string) => body.split("\n")[0]!.split(/[{]/)[0]!;

describe("mail in the recipient's stored language", () => {
  it("a Spanish reader's password reset arrives in Spanish and its link still works", async () => {
    const org = await createOrganization("Reset Idioma Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "reset-es" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, p!.id));
    expect((await postJson(anonymous(), "/api/auth/request-password-reset", { email: p!.email, redirectTo: "/reset-password" })).status).toBe(200);
    const mail = await waitForMail(p!.email);
    expect(mail.subject).toBe(esMail.auth.reset.subject);
    expect(mail.text).toContain(`Hola, ${p!.name}:`);
    expect(mail.text).toContain(firstLine(esMail.auth.reset.body));
    expect(mail.text).not.toMatch(/Someone asked|ignore this message/);
    const hop = await fetchFrom(freshIp(), linkIn(mail.text), { redirect: "manual" });
    expect([302, 303, 307]).toContain(hop.status);
  });

  it("a Spanish reader's e-mail change: the confirmation and the notice to the old address are in Spanish", async () => {
    const org = await createOrganization("Correo Idioma Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "change-es" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, p!.id));
    const client = await signIn(p!.email, TEST_PASSWORD);
    const next = uniqueEmail("change-es-new");
    const res = await postJson(client, "/api/auth/change-email", { newEmail: next, callbackURL: "/account?email=changed", password: TEST_PASSWORD });
    expect(res.status, res.text).toBe(200);
    const confirm = await waitForMail(next);
    expect(confirm.subject).toBe(esMail.auth.changeEmail.subject);
    expect(confirm.text).toContain(`en lugar de ${p!.email}.`);
    expect(confirm.text).not.toMatch(/You asked to use this address/);
    const notice = await waitForMail(p!.email, /cambiar/);
    expect(notice.subject).toBe(esMail.auth.changeNotice.subject);
    expect(notice.text).toContain(`cambiar su dirección de correo a ${next}.`);
    expect(notice.text).not.toMatch(/Someone signed in/);
  });
});
