import { json, route } from "@/lib/api";
import { queryOf } from "@/lib/admin";
import { listPeople } from "@/lib/admin";
import { peopleQuery } from "@/lib/admin";

/** GET /api/admin/people?q&role&organizationId&status&page&pageSize&sort&dir → people across organizations. */
export const GET = route("admin", async ({ req }) => json(await listPeople(peopleQuery.parse(queryOf(req)))));
