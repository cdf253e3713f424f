import { json, route } from "@/lib/api";
import { contentStatus } from "@/lib/admin";

/** GET /api/admin/content → synced counts, repository counts or problems, recent syncs, retired items. */
export const GET = route("admin", async () => json(await contentStatus()));
