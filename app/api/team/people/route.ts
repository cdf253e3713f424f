import { json, route } from "@/lib/api";
import { searchPeople } from "@/lib/team";
import { resolveScope } from "@/lib/access";

/** GET /api/team/people?q=[&org=] → up to 20 people of the organization whose name or e-mail matches. */
export const GET = route("manager", async ({ req, viewer }) => {
  const url = new URL(req.url);
  const scope = await resolveScope(viewer, url.searchParams.get("org"));
  const q = (url.searchParams.get("q") ?? "").trim().slice(0, 100);
  return json({ people: await searchPeople(scope, q) });
});
