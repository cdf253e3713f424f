import { json, route } from "@/lib/api";
import { DomainError } from "@/lib/errors";
import { planFor } from "@/lib/offline";

/**
 * GET /api/offline/modules/[module] → what "Keep on this phone" stores for the module: its page,
 * lessons, linked cards, the glossary and the calculators, with the content version of that set.
 */
export const GET = route<{ module: string }>("signed-in", async ({ params }) => {
  const { module } = params;
  const plan = planFor(module);
  if (!plan) throw new DomainError("not-found", `No module "${module}".`);
  return json(plan);
});
