import { clientIp, json, readJson, route } from "@/lib/api";
import { assertSameOrigin, queryOf } from "@/lib/admin";
import { createOrganization, listOrganizations } from "@/lib/admin";
import { createOrganizationSchema, organizationsQuery } from "@/lib/admin";

/** GET /api/admin/organizations?q&page&pageSize&sort&dir → organizations with seats, people and teams. */
export const GET = route("admin", async ({ req }) => json(await listOrganizations(organizationsQuery.parse(queryOf(req)))));

/** POST /api/admin/organizations { name, kind, seats } → creates one (audited: organization.create). */
export const POST = route("admin", async ({ req, viewer }) => {
  assertSameOrigin(req);
  const input = await readJson(req, createOrganizationSchema);
  return json(await createOrganization(viewer, input, clientIp(req)), 201);
});
