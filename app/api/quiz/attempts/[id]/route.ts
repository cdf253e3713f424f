import { getLocale } from "next-intl/server";
import { json, route } from "@/lib/api";
import { localeOf } from "@/lib/i18n/browser";
import { viewAttempt } from "@/lib/quiz";

/** GET an attempt: while open, its questions and saved answers; once graded, the results. */
export const GET = route<{ id: string }>("signed-in", async ({ viewer, params }) => json(await viewAttempt(viewer, params.id, localeOf(await getLocale()))));
