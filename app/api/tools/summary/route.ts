import { route } from "@/lib/api";
import { summaryPdfResponse } from "@/lib/tools";

/** POST { id, input } → a one-page PDF summary, recomputed on the server, for a training file. */
export const POST = route("signed-in", async ({ req }) => summaryPdfResponse(req));
