import "server-only";
import { and, count, desc, eq, gte } from "drizzle-orm";
import { db } from "@/db/client";
import { contentSync, mailLog, organization, user } from "@/db/schema";
import { listAudit, type AuditRow } from "./audit-log";
import { addDays } from "@/lib/dates";

export type AdminOverview = {
  organizations: number;
  people: number;
  banned: number;
  mailFailedWeek: number;
  lastSync: { at: Date; ok: boolean } | null;
  recent: AuditRow[];
};

/** The figures on the admin overview: one small query each. */
export async function adminOverview(): Promise<AdminOverview> {
  const weekAgo = addDays(new Date(), -7);
  const [[orgs], [people], [banned], [failed], [sync], recent] = await Promise.all([
    db.select({ n: count() }).from(organization),
    db.select({ n: count() }).from(user),
    db.select({ n: count() }).from(user).where(eq(user.banned, true)),
    db.select({ n: count() }).from(mailLog).where(and(eq(mailLog.status, "failed"), gte(mailLog.at, weekAgo))),
    db.select({ at: contentSync.at, ok: contentSync.ok }).from(contentSync).orderBy(desc(contentSync.at), desc(contentSync.id)).limit(1),
    listAudit({ page: 1, pageSize: 5, sort: "at", dir: "desc", action: undefined, actor: undefined, organizationId: undefined }),
  ]);
  return {
    organizations: orgs?.n ?? 0,
    people: people?.n ?? 0,
    banned: banned?.n ?? 0,
    mailFailedWeek: failed?.n ?? 0,
    lastSync: sync ?? null,
    recent: recent.rows,
  };
}
