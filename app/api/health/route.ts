import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { json } from "@/lib/api";

export const dynamic = "force-dynamic";

export async function GET() {
  const started = Date.now();
  try {
    await db.execute(sql`select 1`);
    return json({ status: "ok", database: "up", ms: Date.now() - started });
  } catch {
    return json({ status: "degraded", database: "down", message: "The database is not reachable." }, { status: 503, headers: { "Retry-After": "10" } });
  }
}
