// Every lesson and card renders through the real app; progress is idempotent and private.
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { lessonOpen, lessonProgress, user } from "@/db/schema";
import { demoByRole, DEMO_PEOPLE } from "@/db/demo";
import { loadCatalogFrom } from "@/lib/content/load";
import { postJson, signIn, type Client } from "../helpers/http";
import { TEST_PASSWORD, createPeople, backdateOpens, openLessons, readAndComplete } from "../helpers/fixtures";

const catalog = loadCatalogFrom(path.resolve("content"));
let learner: Client;
let otherLearner: Client;
let manager: Client; // Quillmoor
let builderManager: Client; // Larkhaven

beforeAll(async () => {
  learner = await signIn("ines@quillmoor.example");
  otherLearner = await signIn("tobin@quillmoor.example");
  manager = await signIn(demoByRole("manager", "quillmoor").email);
  builderManager = await signIn(demoByRole("manager", "larkhaven").email);
});
afterAll(() => pool.end());

describe("rendering", () => {
  it("renders every lesson with its title, edition note and sources", async () => {
    for (const m of catalog.modules) {
      for (const l of m.lessons) {
        const res = await learner.fetch(`/modules/${m.slug}/${l.slug}`);
        expect(res.status, `${m.slug}/${l.slug}`).toBe(200);
        const html = await res.text();
        expect(html).toContain('data-testid="edition-note"');
        expect(html).toContain("Sources for the numbers");
      }
    }
  });

  it("renders every card and module page", async () => {
    for (const c of catalog.cards) {
      const res = await learner.fetch(`/reference/${c.slug}`);
      expect(res.status, c.slug).toBe(200);
      expect(await res.text()).toContain("Related lessons");
    }
    for (const m of catalog.modules) expect((await learner.fetch(`/modules/${m.slug}`)).status, m.slug).toBe(200);
  });

  it("answers an unknown lesson or card with 404", async () => {
    expect((await learner.fetch("/modules/freeze-protection/no-such-lesson")).status).toBe(404);
    expect((await learner.fetch("/reference/no-such-card")).status).toBe(404);
  });
});

describe("progress", () => {
  const mod = "pipe-and-joining";
  const lesson = "choosing-pipe-materials";
  // a throw-away person in the demo contractor (its manager may read the progress; another may not)
  let reader: { id: string; email: string; client: Client };

  beforeAll(async () => {
    const [ines] = await db.select({ organizationId: user.organizationId }).from(user).where(eq(user.email, "ines@quillmoor.example"));
    const [p] = await createPeople(1, { organizationId: ines!.organizationId!, tag: "progress" });
    reader = { ...p!, client: await signIn(p!.email, TEST_PASSWORD) };
  });

  it("stores one row when a lesson is marked complete twice", async () => {
    const [a] = await readAndComplete(reader.client, reader.id, mod, [lesson]);
    const b = await postJson(reader.client, "/api/progress", { module: mod, lesson });
    expect(b.json).toEqual(a!.json);
    const rows = await db.select().from(lessonProgress).where(eq(lessonProgress.userId, reader.id));
    expect(rows.filter((r) => r.lessonId)).toHaveLength((a!.json.completed as string[]).length);
    expect(a!.json.completed).toContain(lesson);
  });

  it("counts a lesson only after the server-recorded reading time (half the lesson's minutes)", async () => {
    const l = catalog.modules.find((m) => m.slug === mod)!.lessons.find((x) => x.slug !== lesson)!;
    // never opened: the API alone cannot mark it
    const unopened = await postJson(reader.client, "/api/progress", { module: mod, lesson: l.slug });
    expect(unopened.status).toBe(409);
    expect(unopened.json.error).toMatch(/Open the lesson/);
    // opened just now: still too early, whatever the client claims
    await openLessons(reader.client, mod, [l.slug]);
    const early = await postJson(reader.client, "/api/progress", { module: mod, lesson: l.slug, readSeconds: 99_999, openedAt: "2020-01-01T00:00:00Z" });
    expect(early.status).toBe(409);
    expect(early.json.error).toContain(`after ${Math.ceil((l.meta.minutes * 60) / 2 / 60)} minutes of reading time`);
    expect((await db.select().from(lessonProgress).where(eq(lessonProgress.userId, reader.id))).length).toBe(1);
    // opening again does not restart or move the stamp forward; once the time has passed it counts
    const [first] = await db.select().from(lessonOpen).where(eq(lessonOpen.userId, reader.id));
    await openLessons(reader.client, mod, [l.slug]);
    await backdateOpens(reader.id, mod, Math.ceil(l.meta.minutes / 2) + 1);
    const ok = await postJson(reader.client, "/api/progress", { module: mod, lesson: l.slug });
    expect(ok.status, ok.text).toBe(200);
    expect(first).toBeTruthy();
    // the person's record shows the reading time the server counted
    const rec = await (await reader.client.fetch(`/api/progress?module=${mod}`)).json();
    const t = (rec.readingTimes as { lesson: string; readingSeconds: number }[]).find((x) => x.lesson === l.slug)!;
    expect(t.readingSeconds).toBeGreaterThanOrEqual(Math.ceil((l.meta.minutes * 60) / 2));
  });

  it("sends lesson pages as private: no shared cache may keep a copy past the session check", async () => {
    const res = await reader.client.fetch(`/modules/${mod}/${lesson}`);
    expect(res.status).toBe(200);
    const cc = res.headers.get("cache-control") ?? "";
    expect(cc).toMatch(/private|no-store/);
    expect(cc).not.toMatch(/s-maxage|public/);
  });

  it("refuses unknown lessons and malformed bodies clearly", async () => {
    const unknown = await postJson(learner, "/api/progress", { module: mod, lesson: "nope" });
    expect(unknown.status).toBe(404);
    const bad = await postJson(learner, "/api/progress", { module: "../etc", lesson: 5 });
    expect(bad.status).toBe(400);
    expect(bad.json.fieldErrors).toBeTruthy();
  });

  it("keeps one person's progress from another learner and from another organization's manager", async () => {
    expect((await otherLearner.fetch(`/api/progress?userId=${reader.id}`)).status).toBe(403);
    expect((await builderManager.fetch(`/api/progress?userId=${reader.id}`)).status).toBe(403);
    const own = await manager.fetch(`/api/progress?userId=${reader.id}&module=${mod}`);
    expect(own.status).toBe(200);
    expect((await own.json()).completed).toContain(lesson);
    const rows = await db.select().from(lessonProgress).where(and(eq(lessonProgress.userId, reader.id)));
    expect(rows.length).toBeGreaterThan(0);
    expect(DEMO_PEOPLE.length).toBeGreaterThanOrEqual(12);
  });
});

describe("search API", () => {
  it("returns a bounded JSON result list and copes with odd queries", async () => {
    const res = await learner.fetch("/api/search?q=antifreeze&limit=500");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.count).toBeGreaterThan(0);
    expect(body.hits.length).toBeLessThanOrEqual(20);
    expect(body.hits[0].titleMatch).toBe(true);
    for (const q of ["", "%27%20OR%201%3D1", "x".repeat(500), "%3Cscript%3E"]) {
      const r = await learner.fetch(`/api/search?q=${q}`);
      expect(r.status, q).toBe(200);
    }
  });
});
