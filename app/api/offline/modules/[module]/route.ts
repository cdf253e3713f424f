import { json, route } from "@/lib/api";
import { contentLocale } from "@/lib/content";
import { DomainError } from "@/lib/errors";
import { requestLocale } from "@/lib/i18n";
import { planFor } from "@/lib/offline";

/**
 * GET /api/offline/modules/[module] → what "Keep on this phone" stores for the module: its page,
 * lessons, linked cards, the glossary and the calculators, with the content version of that set in
 * the reader's language (the pages are stored as the server renders them for this person).
 */
export const GET = route<{ module: string }>("signed-in", async ({ params }) => {
  const { module } = params;
  const plan = planFor(module, contentLocale(await requestLocale()));
  if (!plan) throw new DomainError("not-found", `No module "${module}".`);
  return json(plan);
});
