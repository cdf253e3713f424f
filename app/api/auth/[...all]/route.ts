import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth";
import { errorResponse, json } from "@/lib/api";
import { inRequestLanguage } from "@/lib/i18n";

const handlers = toNextJsHandler(auth);

/**
 * better-auth's admin endpoints (ban, set role, impersonate, remove, set password …) are not served
 * over HTTP: admins act through /api/admin/*, which calls them on the server and writes the audit log.
 */
function adminPath(req: Request): Response | null {
  if (!new URL(req.url).pathname.startsWith("/api/auth/admin/")) return null;
  return json({ error: "Not found. Admin actions go through the admin console, which records them in the audit log." }, 404);
}

// better-auth answers its own errors; a database outage still becomes a clear 503.
export async function GET(req: Request) {
  const blocked = adminPath(req);
  if (blocked) return blocked;
  try {
    return await handlers.GET(req);
  } catch (err) {
    return errorResponse(err);
  }
}
// sign-in, sign-up and password-reset refusals of Riser's own (a paused sign-in) in the request's language
export const POST = inRequestLanguage(async function post(req: Request) {
  const blocked = adminPath(req);
  if (blocked) return blocked;
  try {
    return forgetOnSignOut(req, await handlers.POST(req));
  } catch (err) {
    return errorResponse(err);
  }
});

/**
 * After sign-out the browser drops what this origin stored (lesson pages kept for offline use,
 * queued marks, the service worker): the page deletes them itself first, this makes sure.
 */
function forgetOnSignOut(req: Request, res: Response): Response {
  if (new URL(req.url).pathname !== "/api/auth/sign-out" || !res.ok) return res;
  const out = new Response(res.body, res);
  out.headers.set("Clear-Site-Data", '"cache", "storage"');
  return out;
}
