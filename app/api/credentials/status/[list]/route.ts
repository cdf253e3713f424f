import { route } from "@/lib/api";
import { parseListNumber, signedStatusList } from "@/lib/credentials";

/**
 * GET /api/credentials/status/:list (public) → the revocation BitstringStatusListCredential as a
 * VC-JWT, current at the request (a revocation shows at once). Not a number → 400; past the last list → 404.
 */
export const GET = route<{ list: string }>("public", async ({ params }) => {
  const list = await parseListNumber(params.list);
  return new Response(await signedStatusList(list), { headers: { "Content-Type": "application/vc+jwt", "Cache-Control": "no-cache" } });
});
