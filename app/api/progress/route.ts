import { z } from "zod";
import { json, readJson, route } from "@/lib/api";
import { assertCanReadPerson, markLessonComplete, progressByModule, readingTimes } from "@/lib/progress";
import { slug } from "@/lib/content";

/**
 * GET /api/progress?module=…[&userId=…] → completed lessons of a module (own, or a managed person's)
 * and the reading time the server recorded for each opened lesson.
 */
export const GET = route("signed-in", async ({ req, viewer }) => {
  const url = new URL(req.url);
  const personId = url.searchParams.get("userId") ?? viewer.id;
  await assertCanReadPerson(viewer, personId);
  const all = await progressByModule(personId);
  const moduleSlug = url.searchParams.get("module");
  if (moduleSlug) return json({ module: moduleSlug, completed: all.get(moduleSlug)?.completed ?? [], readingTimes: await readingTimes(personId, moduleSlug) });
  return json({ modules: [...all.values()].map((p) => ({ module: p.module, completed: p.completed })) });
});

/** Sent with a mark made offline: what the phone measured (0 s … 24 h) and when it was marked there. */
const deviceReport = z.object({
  readingSeconds: z.number().int().min(0).max(24 * 3600),
  markedAt: z.iso.datetime({ offset: true }).transform((v) => new Date(v)),
});
const body = z.object({ module: slug, lesson: slug, offline: deviceReport.optional() });

/**
 * POST /api/progress { module, lesson, offline? } → marks the lesson complete for the viewer (idempotent),
 * once the server-recorded reading time meets the seat-time rule (lib/progress); too early → 409.
 * `offline` ({ readingSeconds, markedAt }) comes with a mark queued on a phone with no connection;
 * it is stored as the phone's report and never counts toward the rule.
 */
export const POST = route("signed-in", async ({ req, viewer }) => {
  const input = await readJson(req, body);
  const completed = await markLessonComplete(viewer.id, input.module, input.lesson, input.offline);
  return json({ module: input.module, completed });
});
