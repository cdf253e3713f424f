import { json, route } from "@/lib/api";
import { jwks, keyRing } from "@/lib/credentials";

/** GET /.well-known/jwks.json (public) → the credential signing keys, current and retired (RFC 7517 JWK Set). */
export const GET = route("public", async () => json(jwks(await keyRing()), { headers: { "Cache-Control": "public, max-age=300" } }));
