import { json, route } from "@/lib/api";
import { queryOf } from "@/lib/admin/http";
import { listPeople } from "@/lib/admin/people";
import { peopleQuery } from "@/lib/admin/schemas";

/** GET /api/admin/people?q&role&organizationId&status&page&pageSize&sort&dir → people across organizations. */
export const GET = route("admin", async ({ req }) => json(await listPeople(peopleQuery.parse(queryOf(req)))));
