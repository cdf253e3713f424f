import { getLocale } from "next-intl/server";
import { json, readJson, route } from "@/lib/api";
import { localeOf } from "@/lib/i18n/browser";
import { refresherSubmitSchema, refreshersOf, submitRefresher } from "@/lib/refreshers";

/** GET /api/refreshers → the refreshers the signed-in person owes (changed lessons, questions without their keys). */
export const GET = route("signed-in", async ({ viewer }) => json({ refreshers: await refreshersOf(viewer, localeOf(await getLocale())) }));

/** POST /api/refreshers { module, answers: [{ position, answer }] } → graded on the server; a pass clears the refresher. */
export const POST = route("signed-in", async ({ req, viewer }) => {
  const input = await readJson(req, refresherSubmitSchema);
  const result = await submitRefresher(viewer, input);
  return json({ ...result, message: result.passed ? "Refresher done. Thank you." : `Not yet: ${result.correct} of ${result.total} right. Re-read the changes and try again.` });
});
