import { getLocale } from "next-intl/server";
import { json, readJson, route } from "@/lib/api";
import { localeOf } from "@/lib/i18n/browser";
import { inRequestLanguage } from "@/lib/i18n";
import { submitAttempt } from "@/lib/quiz";
import { answersBody } from "@/lib/quiz";

/** POST { answers? } → graded on the server once; repeats return the same result. */
export const POST = inRequestLanguage(route<{ id: string }>("signed-in", async ({ req, viewer, params }) => {
  const hasBody = req.headers.get("content-length") !== "0" && req.headers.get("content-type")?.includes("json");
  const { answers } = hasBody ? await readJson(req, answersBody.partial()) : { answers: [] };
  return json(await submitAttempt(viewer, params.id, answers ?? [], localeOf(await getLocale())));
}));
