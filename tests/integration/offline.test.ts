// Job-site mode on the server: the manifest and service worker as served, the list of pages a phone
// keeps for a module, and marks made offline (device-reported reading time never beats the
// server's seat-time rule, and a repeat leaves one row).
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, lessonProgress, user } from "@/db/schema";
import { loadCatalog } from "@/lib/content";
import { OFFLINE_SHELL } from "@/lib/offline/names";
import { backdateOpens, clientOf, createOrganization, createPerson, openLessons } from "../helpers/fixtures";
import { anonymous, getJson, postJson } from "../helpers/http";

const MODULE = "freeze-protection";
const LESSON = "where-homes-freeze";

async function progressRows(userId: string) {
  return db
    .select({ seconds: lessonProgress.deviceReadingSeconds, markedAt: lessonProgress.deviceMarkedAt, completedAt: lessonProgress.completedAt })
    .from(lessonProgress)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(and(eq(lessonProgress.userId, userId), eq(catalogModule.slug, MODULE), eq(catalogLesson.slug, LESSON)));
}

describe("installable", () => {
  it("serves the web app manifest: standalone, opens to the learner's home, Riser's PNG icons incl. a maskable one", async () => {
    const res = await anonymous().fetch("/manifest.webmanifest");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/application\/manifest\+json/);
    const m = (await res.json()) as { start_url: string; display: string; name: string; icons: { src: string; sizes: string; purpose: string }[] };
    // Installability needs name, start_url, display standalone and 192 px + 512 px icons
    // (W3C Web Application Manifest; Chromium's installability criteria, from memory — verify).
    expect(m).toMatchObject({ start_url: "/learn", display: "standalone", name: expect.stringContaining("Riser") });
    expect(m.icons.map((i) => i.sizes)).toEqual(expect.arrayContaining(["192x192", "512x512"]));
    expect(m.icons.some((i) => i.purpose === "maskable")).toBe(true);
    for (const icon of m.icons) {
      const png = await anonymous().fetch(icon.src);
      expect(png.status, icon.src).toBe(200);
      const bytes = new Uint8Array(await png.arrayBuffer());
      // PNG signature, then the IHDR width (big-endian, bytes 16–19) (PNG spec, ISO/IEC 15948 §5.2, §11.2.2).
      expect([...bytes.slice(1, 4)]).toEqual([0x50, 0x4e, 0x47]);
      expect(new DataView(bytes.buffer).getUint32(16)).toBe(Number(icon.sizes.split("x")[0]));
    }
  });

  it("serves the service worker as JavaScript from the site root, never from a stale cache, with the Serwist precache list", async () => {
    const res = await anonymous().fetch("/sw.js");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/javascript/);
    expect(res.headers.get("cache-control")).toBe("no-cache");
    const body = await res.text();
    expect(body).toContain("/_next/static/");
    // the offline page is precached under its own address (/offline itself comes from the network)
    expect(body).toContain(JSON.stringify(OFFLINE_SHELL));
    expect(body).not.toContain("self.__SW_MANIFEST");
    // the CSP lets it load from this origin only
    expect(res.headers.get("content-security-policy")).toContain("worker-src 'self'");
  });

  it("serves /offline to anyone (it holds nothing personal; the list is read on the phone)", async () => {
    const res = await anonymous().fetch("/offline");
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("Always needs a connection");
  });
});

describe("sign-out", () => {
  it("tells the browser to drop what this site stored (kept pages, queued marks, the worker)", async () => {
    const person = await createPerson({ tag: "offline-signout" });
    const client = await clientOf(person.id);
    const res = await client.fetch("/api/auth/sign-out", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(res.status).toBe(200);
    expect(res.headers.get("clear-site-data")).toBe('"cache", "storage"');
    // the session really ended
    expect((await client.fetch("/api/offline/versions")).status).toBe(401);
  });
});

describe("what a phone keeps for a module", () => {
  it("lists the module, its lessons, linked cards, the glossary and the calculators, with a content version", async () => {
    const person = await createPerson({ tag: "offline-plan" });
    const client = await clientOf(person.id);
    const { status, body } = await getJson<{ version: string; urls: string[] }>(client, `/api/offline/modules/${MODULE}`);
    expect(status).toBe(200);
    expect(body.version).toMatch(/^[0-9a-f]{16}$/);
    expect(body.urls[0]).toBe(`/modules/${MODULE}`);
    expect(body.urls).toContain(`/modules/${MODULE}/${LESSON}`);
    expect(body.urls).toContain("/glossary");
    expect(body.urls).toContain("/tools/sprinkler-flow");
    expect(body.urls).toContain("/offline");
    expect(body.urls.some((u) => u.startsWith("/reference/"))).toBe(true);
    expect(body.urls.some((u) => u.endsWith("/quiz"))).toBe(false);
    // one page of each kind answers this person with 200 (the browser test stores them all)
    const sample = [body.urls[1]!, body.urls.find((u) => u.startsWith("/reference/"))!, "/glossary", "/tools/sprinkler-flow"];
    for (const u of sample) expect((await client.fetch(u, { redirect: "manual" })).status, u).toBe(200);
    const versions = await getJson<{ modules: Record<string, string> }>(client, "/api/offline/versions");
    expect(versions.body.modules[MODULE]).toBe(body.version);
    expect((await getJson(client, "/api/offline/modules/no-such-module")).status).toBe(404);
  });
});

describe("kept in the reader's language", () => {
  it("gives a Spanish reader the Spanish titles and pages under a version of their own, so a change of language replaces kept copies", async () => {
    const en = await clientOf((await createPerson({ tag: "offline-en" })).id);
    const person = await createPerson({ tag: "offline-es" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, person.id));
    const es = await clientOf(person.id);
    const english = await getJson<{ locale: string; title: string; version: string; urls: string[] }>(en, `/api/offline/modules/${MODULE}`);
    const spanish = await getJson<{ locale: string; title: string; version: string; urls: string[] }>(es, `/api/offline/modules/${MODULE}`);
    expect(spanish.status).toBe(200);
    // the titles as written in content/es and content/ (module.yaml, the lesson's frontmatter)
    const catalog = loadCatalog();
    expect(spanish.body).toMatchObject({ locale: "es", title: catalog.es.modules[MODULE]!.title });
    expect(english.body).toMatchObject({ locale: "en", title: catalog.modules.find((m) => m.slug === MODULE)!.meta.title });
    expect(spanish.body.urls).toEqual(english.body.urls);
    expect(spanish.body.version).not.toBe(english.body.version);
    expect((await getJson<{ modules: Record<string, string> }>(es, "/api/offline/versions")).body.modules[MODULE]).toBe(spanish.body.version);
    // the lesson page the phone stores for this reader is the Spanish one
    const page = await (await es.fetch(`/modules/${MODULE}/${LESSON}`)).text();
    expect(page).toContain('lang="es-US"');
    expect(page).toContain(catalog.es.lessons[`${MODULE}/${LESSON}`]!.title);
  });
});

describe("a lesson marked complete with no connection and sent later", () => {
  it("stores the phone's reading time beside the server's, counts only under the server's rule, and a repeat leaves one row", async () => {
    const org = await createOrganization("Offline Mark Test Co");
    const person = await createPerson({ tag: "offline-mark", organizationId: org.id });
    const client = await clientOf(person.id);
    await openLessons(client, MODULE, [LESSON]);
    const forged = { module: MODULE, lesson: LESSON, offline: { readingSeconds: 20 * 3600, markedAt: new Date().toISOString() } };
    // A long reading time claimed by the phone does not shorten the server-measured minimum.
    const early = await postJson(client, "/api/progress", forged);
    expect(early.status).toBe(409);
    expect(await progressRows(person.id)).toHaveLength(0);

    await backdateOpens(person.id, MODULE);
    const markedAt = new Date(Date.now() - 30 * 60_000).toISOString();
    const sent = await postJson(client, "/api/progress", { module: MODULE, lesson: LESSON, offline: { readingSeconds: 540, markedAt } });
    expect(sent.status).toBe(200);
    const again = await postJson(client, "/api/progress", { module: MODULE, lesson: LESSON, offline: { readingSeconds: 9999, markedAt } });
    expect(again.status).toBe(200);
    const rows = await progressRows(person.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.seconds).toBe(540);
    expect(rows[0]!.markedAt?.toISOString()).toBe(markedAt);

    const { body } = await getJson<{ readingTimes: { lesson: string; readingSeconds: number; deviceReadingSeconds: number | null }[] }>(client, `/api/progress?module=${MODULE}`);
    const t = body.readingTimes.find((x) => x.lesson === LESSON)!;
    expect(t.deviceReadingSeconds).toBe(540);
    expect(t.readingSeconds).toBeGreaterThanOrEqual(24 * 3600 - 5);
    // the person's own records say which reading time came from the phone
    const records = await getJson<{ lessons: { lesson: string; deviceReadingSeconds: number | null }[] }>(client, "/api/account/records?format=json");
    expect(records.body.lessons.find((l) => l.lesson === LESSON)?.deviceReadingSeconds).toBe(540);
    const csv = await (await client.fetch("/api/account/records?format=csv")).text();
    expect(csv).toContain("reading time reported by the phone: 540 s");
    // and so does the person's page their training manager sees
    const manager = await createPerson({ tag: "offline-manager", role: "manager", organizationId: org.id });
    const page = await (await clientOf(manager.id)).fetch(`/team/people/${person.id}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("9 min reported by the phone");
  });

  it("clamps a mark dated in the future to its arrival, and refuses a malformed report with field errors", async () => {
    const person = await createPerson({ tag: "offline-bad" });
    const client = await clientOf(person.id);
    await openLessons(client, MODULE, [LESSON]);
    for (const offline of [{ readingSeconds: -1, markedAt: new Date().toISOString() }, { readingSeconds: 24 * 3600 + 1, markedAt: new Date().toISOString() }, { readingSeconds: 60, markedAt: "yesterday" }]) {
      const r = await postJson(client, "/api/progress", { module: MODULE, lesson: LESSON, offline });
      expect(r.status, JSON.stringify(offline)).toBe(400);
      expect(r.json.fieldErrors).toBeTruthy();
    }
    await backdateOpens(person.id, MODULE);
    const future = new Date(Date.now() + 7 * 24 * 3600_000).toISOString();
    expect((await postJson(client, "/api/progress", { module: MODULE, lesson: LESSON, offline: { readingSeconds: 60, markedAt: future } })).status).toBe(200);
    const [row] = await progressRows(person.id);
    expect(row!.markedAt!.getTime()).toBeLessThanOrEqual(row!.completedAt.getTime());
  });
});
