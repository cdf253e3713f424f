import { json, route } from "@/lib/api";
import { didDocument, keyRing } from "@/lib/credentials";

/** GET /.well-known/did.json (public) → this instance's did:web document with every published key. */
export const GET = route("public", async () =>
  json(didDocument(await keyRing()), { headers: { "Cache-Control": "public, max-age=300", "Content-Type": "application/did+json" } }),
);
