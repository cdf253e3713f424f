import "server-only";
import { and, count, eq, gte, isNull, like, lt, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import type { z } from "zod";
import { db } from "@/db/client";
import { auditLog, organization, user } from "@/db/schema";
import { toSafeCsv } from "@/lib/csv";
import { containing, iso, offsetOf, ordered } from "./paging";
import type { auditQuery, Paged } from "./schemas";
import { addDays, startOfIsoDay } from "@/lib/dates";

export type AuditRow = {
  id: number;
  at: string | null;
  action: string;
  actorId: string | null;
  actorEmail: string | null;
  organizationId: string | null;
  organization: string | null;
  targetType: string;
  targetId: string;
  targetLabel: string | null;
  reason: string | null;
  ip: string | null;
  details: unknown;
};

type Filters = Omit<z.infer<typeof auditQuery>, "page" | "pageSize" | "sort" | "dir">;

const dayStart = startOfIsoDay;

function whereOf(f: Filters): SQL | undefined {
  const parts: (SQL | undefined)[] = [];
  if (f.action) parts.push(eq(auditLog.action, f.action));
  if (f.actor) parts.push(like(auditLog.actorEmail, containing(f.actor)));
  if (f.organizationId === "none") parts.push(isNull(auditLog.organizationId));
  else if (f.organizationId) parts.push(eq(auditLog.organizationId, f.organizationId));
  if (f.from) parts.push(gte(auditLog.at, dayStart(f.from)));
  // "to" is inclusive: everything before the start of the next day (UTC).
  if (f.to) parts.push(lt(auditLog.at, addDays(dayStart(f.to), 1)));
  return and(...parts);
}

const targetUser = alias(user, "target_user");
const targetOrg = alias(organization, "target_org");

function baseSelect() {
  return db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      action: auditLog.action,
      actorId: auditLog.actorId,
      actorEmail: auditLog.actorEmail,
      organizationId: auditLog.organizationId,
      organization: organization.name,
      targetType: auditLog.targetType,
      targetId: auditLog.targetId,
      targetLabel: sql<string | null>`coalesce(${targetUser.email}, ${targetOrg.name})`,
      reason: auditLog.reason,
      ip: auditLog.ip,
      details: auditLog.details,
    })
    .from(auditLog)
    .leftJoin(organization, eq(organization.id, auditLog.organizationId))
    .leftJoin(targetUser, and(eq(auditLog.targetType, "user"), eq(targetUser.id, auditLog.targetId)))
    .leftJoin(targetOrg, and(eq(auditLog.targetType, "organization"), eq(targetOrg.id, auditLog.targetId)))
    .$dynamic();
}

const toRow = (r: Awaited<ReturnType<ReturnType<typeof baseSelect>["execute"]>>[number]): AuditRow => ({ ...r, at: iso(r.at) });

export async function listAudit(q: z.infer<typeof auditQuery>): Promise<Paged<AuditRow> & { actions: string[] }> {
  const where = whereOf(q);
  const sortColumn = { at: auditLog.at, action: auditLog.action, actor: auditLog.actorEmail, target: auditLog.targetId }[q.sort];
  const rows = await baseSelect().where(where).orderBy(ordered(sortColumn, q.dir), ordered(auditLog.id, q.dir)).limit(q.pageSize).offset(offsetOf(q));
  const [total] = await db.select({ n: count() }).from(auditLog).where(where);
  const actions = (await db.selectDistinct({ action: auditLog.action }).from(auditLog).orderBy(auditLog.action)).map((a) => a.action);
  return { rows: rows.map(toRow), total: total?.n ?? 0, page: q.page, pageSize: q.pageSize, actions };
}

export const AUDIT_EXPORT_LIMIT = 50_000;

/** The filtered audit log as CSV (newest first), cells that a spreadsheet would run as formulas neutralised. */
export async function auditCsv(f: Filters): Promise<{ csv: string; rows: number; truncated: boolean }> {
  const rows = (await baseSelect().where(whereOf(f)).orderBy(ordered(auditLog.at, "desc"), ordered(auditLog.id, "desc")).limit(AUDIT_EXPORT_LIMIT + 1)).map(toRow);
  const truncated = rows.length > AUDIT_EXPORT_LIMIT;
  const kept = rows.slice(0, AUDIT_EXPORT_LIMIT);
  const csv = toSafeCsv(
    kept.map((r) => ({
      time_utc: r.at,
      action: r.action,
      actor_email: r.actorEmail,
      actor_id: r.actorId,
      organization: r.organization,
      organization_id: r.organizationId,
      target_type: r.targetType,
      target_id: r.targetId,
      target: r.targetLabel,
      reason: r.reason,
      ip: r.ip,
      details: r.details == null ? "" : JSON.stringify(r.details),
    })),
    ["time_utc", "action", "actor_email", "actor_id", "organization", "organization_id", "target_type", "target_id", "target", "reason", "ip", "details"],
  );
  return { csv, rows: kept.length, truncated };
}
