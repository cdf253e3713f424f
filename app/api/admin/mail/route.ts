import { json, route } from "@/lib/api";
import { queryOf } from "@/lib/admin";
import { listMail } from "@/lib/admin";
import { mailQuery } from "@/lib/admin";

/** GET /api/admin/mail?q&status&page&pageSize&sort&dir → the outgoing mail log (bodies only on development and test instances). */
export const GET = route("admin", async ({ req }) => json(await listMail(mailQuery.parse(queryOf(req)))));
