// Password reset by mail: request → mail from the local catcher → the link → new password works,
// the old one no longer does; an unknown address gets the same answer (no account probing).
import { afterAll, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { APP, fetchFrom, freshIp, linkIn, mailsTo, postJson, anonymous, signIn, waitForMail } from "../helpers/http";
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
