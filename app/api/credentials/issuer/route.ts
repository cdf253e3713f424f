import { json, route } from "@/lib/api";
import { issuerProfile, OB_CONTEXT, VC_CONTEXT_V2 } from "@/lib/credentials";
import { env } from "@/lib/env";

/** GET /api/credentials/issuer (public) → the issuer Profile every credential names (OB 3.0 Profile). */
export const GET = route("public", async () =>
  json({ "@context": [VC_CONTEXT_V2, OB_CONTEXT], ...issuerProfile(env.APP_URL) }, { headers: { "Cache-Control": "public, max-age=3600" } }),
);
