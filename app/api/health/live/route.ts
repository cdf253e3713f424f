import { json, route } from "@/lib/api";

export const dynamic = "force-dynamic";

/** GET /api/health/live (public) → 200 while this process answers; touches no database or store. */
export const GET = route("public", async () => json({ status: "live", uptimeSeconds: Math.round(process.uptime()) }));
