import { json, readJson, route } from "@/lib/api";
import { inRequestLanguage } from "@/lib/i18n";
import { saveAnswers } from "@/lib/quiz";
import { answersBody } from "@/lib/quiz";

/** PUT { answers: [{ position, answer }] } → saved as the person goes (all or nothing). */
export const PUT = inRequestLanguage(route<{ id: string }>("signed-in", async ({ req, viewer, params }) => {
  const { answers } = await readJson(req, answersBody);
  return json(await saveAnswers(viewer, params.id, answers));
}));
