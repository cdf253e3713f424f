import { json, route } from "@/lib/api";
import { moduleVersions } from "@/lib/offline";

/** GET /api/offline/versions → { modules: { slug: version } }: a phone replaces kept copies whose version differs. */
export const GET = route("signed-in", async () => json({ modules: moduleVersions() }));
