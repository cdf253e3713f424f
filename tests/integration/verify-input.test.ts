// The public check accepts the certificate's serial, new grouped codes typed loosely, and old codes.
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate } from "@/db/schema";
import { formatVerificationCode, newVerificationCode } from "@/lib/certificates/verify-code";
import { anonymous, getJson } from "../helpers/http";
import { completedWithCertificate, daysFromNow, fixtureOrg, fixturePerson } from "../helpers/fixtures";

let oldCert: typeof certificate.$inferSelect | undefined;
let newCert: typeof certificate.$inferSelect | undefined;

beforeAll(async () => {
  const org = await fixtureOrg("Wyndle Sprinkler");
  const a = await fixturePerson(org, { name: "Corin Abbet" });
  const b = await fixturePerson(org, { name: "Delphine Orme" });
  await completedWithCertificate(a, "freeze-protection", { completedAt: daysFromNow(-10), expiresAt: daysFromNow(300) });
  await completedWithCertificate(b, "freeze-protection", { completedAt: daysFromNow(-10), expiresAt: daysFromNow(300) });
  [oldCert] = await db.select().from(certificate).where(eq(certificate.userId, a.id));
  const code = newVerificationCode(randomBytes);
  await db.update(certificate).set({ verificationCode: code }).where(eq(certificate.userId, b.id));
  [newCert] = await db.select().from(certificate).where(eq(certificate.userId, b.id));
});
afterAll(() => pool.end());

describe("/api/verify and /verify", () => {
  it("accepts the serial printed on the certificate", async () => {
    const r = await getJson<{ holderName: string; serial: string }>(anonymous(), `/api/verify/${oldCert!.serial}`);
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ holderName: "Corin Abbet", serial: oldCert!.serial });
    const page = await anonymous().fetch(`/verify?code=${encodeURIComponent(oldCert!.serial.toLowerCase())}`);
    expect(page.status).toBe(307);
    expect(page.headers.get("location")).toContain(`/verify/${oldCert!.serial}`);
  });
  it("accepts a new code grouped, in small letters, and an old code exactly", async () => {
    const typed = formatVerificationCode(newCert!.verificationCode).toLowerCase();
    const r = await getJson<{ holderName: string }>(anonymous(), `/api/verify/${encodeURIComponent(typed)}`);
    expect(r.status).toBe(200);
    expect(r.body.holderName).toBe("Delphine Orme");
    expect((await getJson(anonymous(), `/api/verify/${oldCert!.verificationCode}`)).status).toBe(200);
    expect((await getJson(anonymous(), `/api/verify/${oldCert!.verificationCode.toLowerCase()}`)).status).toBe(404);
  });
  it("the page says where the code is on the certificate: under the verification address", async () => {
    const html = await (await anonymous().fetch("/verify")).text();
    expect(html).toContain("under the verification address");
    expect(html).not.toContain("under the QR code");
  });
});
