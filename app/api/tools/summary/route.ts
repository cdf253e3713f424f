import { getLocale } from "next-intl/server";
import { route } from "@/lib/api";
import { localeOf } from "@/lib/i18n/browser";
import { summaryPdfResponse } from "@/lib/tools";

/** POST { id, input } → a one-page PDF summary in the reader's language, recomputed on the server, for a training file. */
export const POST = route("signed-in", async ({ req }) => summaryPdfResponse(req, { language: localeOf(await getLocale()) }));
