import { readFile } from "node:fs/promises";
import path from "node:path";
import { route } from "@/lib/api";
import { SERVICE_WORKER_URL } from "@/lib/offline";

export const dynamic = "force-dynamic";

/**
 * GET /sw.js → the service worker that scripts/build-sw.mjs built with this app's build (its
 * precache list names this build's files). `no-cache` so a phone picks up a new deploy at once.
 */
export const GET = route("public", async () => {
  const file = path.join(process.cwd(), process.env.NEXT_DIST_DIR || ".next", "riser-sw", "sw.js");
  const body = await readFile(file, "utf8").catch(() => null);
  if (body === null) return Response.json({ error: `No service worker in this build: run \`node scripts/build-sw.mjs\` after next build (${SERVICE_WORKER_URL}).` }, { status: 404, headers: { "Cache-Control": "no-store" } });
  return new Response(body, {
    headers: {
      "Content-Type": "text/javascript; charset=utf-8",
      "Cache-Control": "no-cache",
      "Service-Worker-Allowed": "/",
    },
  });
});
