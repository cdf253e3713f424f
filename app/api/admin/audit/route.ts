import { json, route } from "@/lib/api";
import { listAudit } from "@/lib/admin";
import { queryOf } from "@/lib/admin";
import { auditQuery } from "@/lib/admin";

/** GET /api/admin/audit?action&actor&organizationId&from&to&page&pageSize&sort&dir → audit rows, newest first by default. */
export const GET = route("admin", async ({ req }) => json(await listAudit(auditQuery.parse(queryOf(req)))));
