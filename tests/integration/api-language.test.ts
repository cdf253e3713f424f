/**
 * Refusals from the API in the language of the request: the signed-in person's stored language,
 * else the browser's Accept-Language (RFC 9110 §12.5.4). The expected English is what the shared
 * schema itself produces for the input; the expected Spanish is the same key of the Spanish
 * catalog (messages/es/errors.json). Successful answers and English requests are left as they were.
 */
import { eq } from "drizzle-orm";
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { organization, user } from "@/db/schema";
import { signUpSchema } from "@/lib/auth/browser";
import { anonymous, freshIp, postJson, signIn } from "../helpers/http";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

const catalog = (locale: string) => JSON.parse(readFileSync(path.join(process.cwd(), "messages", locale, "errors.json"), "utf8")) as Record<string, string>;
const en = catalog("en");
const es = catalog("es");
const bad = { name: "Tess Quarry", email: "not-an-address", password: "short", organizationName: "Quarry Sprinkler Co" };

let org: { id: string; teamId: string };
beforeAll(async () => {
  org = await createOrganization("Idioma Test Fire Co");
});
afterAll(() => pool.end());

describe("API refusals in the request's language", () => {
  it("answers a bad sign-up in English by default, with the schema's own messages", async () => {
    const res = await postJson(anonymous(), "/api/account/sign-up", bad);
    expect(res.status).toBe(400);
    const body = res.json as { error: string; fieldErrors: Record<string, string[]> };
    const schema = signUpSchema.safeParse(bad);
    const byField = (f: string) => schema.error!.issues.filter((i) => i.path[0] === f).map((i) => i.message);
    expect(body.error).toBe(en.fieldsNeedAttention);
    expect(body.fieldErrors.email).toEqual(byField("email"));
    expect(body.fieldErrors.password).toEqual(byField("password"));
  });

  it("answers the same sign-up in Spanish for a browser that prefers Spanish", async () => {
    const res = await anonymous().fetch("/api/account/sign-up", {
      method: "POST",
      headers: { "content-type": "application/json", "accept-language": "es-MX,es;q=0.9" },
      body: JSON.stringify(bad),
    });
    expect(res.status).toBe(400);
    expect(res.headers.get("content-language")).toBe("es-US");
    const body = (await res.json()) as { error: string; fieldErrors: Record<string, string[]> };
    expect(body.error).toBe(es.fieldsNeedAttention);
    expect(body.fieldErrors.email).toEqual([es.emailFormat]);
    expect(body.fieldErrors.password).toEqual([es.passwordMin]);
  });

  it("a company that signs up in Spanish gets a Spanish account and Spanish invitations by default", async () => {
    const email = `alta-${Date.now().toString(36)}@test.example`;
    const res = await anonymous().fetch("/api/account/sign-up", {
      method: "POST",
      headers: { "content-type": "application/json", "accept-language": "es-US,es;q=0.9,en;q=0.5" },
      body: JSON.stringify({ name: "Rosalba Quintanar", email, password: "una-frase-larga-de-prueba-2026", organizationName: "Rociadores Piedra Alta" }),
    });
    expect(res.status).toBe(201);
    const [row] = await db.select({ language: user.language, organizationId: user.organizationId }).from(user).where(eq(user.email, email));
    expect(row?.language).toBe("es");
    const [org2] = await db.select({ defaultLanguage: organization.defaultLanguage }).from(organization).where(eq(organization.id, row!.organizationId!));
    expect(org2?.defaultLanguage).toBe("es");
  });

  it("words a quiz refusal in the learner's stored language, whatever the browser says", async () => {
    const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag: "idioma" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, p!.id));
    const client = await signIn(p!.email, TEST_PASSWORD, freshIp());
    const started = await postJson(client, "/api/quiz/attempts", { module: "hydraulics-and-permits" });
    expect(started.status).toBe(201);
    const { id } = started.json as { id: string };
    // position 99 fits the request's shape but is not in the attempt: all-or-nothing refusal (lib/quiz)
    const res = await client.fetch(`/api/quiz/attempts/${id}/answers`, {
      method: "PUT",
      headers: { "content-type": "application/json", "accept-language": "en-US" },
      body: JSON.stringify({ answers: [{ position: 99, answer: "a" }] }),
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: string }).error).toBe(es.answersDoNotFit);
    // the grade itself (a 200) is untouched by the language
    const graded = await postJson(client, `/api/quiz/attempts/${id}/submit`, {});
    expect(graded.status).toBe(200);
    expect((graded.json as { status: string }).status).toBe("graded");
  });
});
