import { clientIp, route } from "@/lib/api";
import { auditCsv } from "@/lib/admin";
import { queryOf } from "@/lib/admin";
import { auditQuery } from "@/lib/admin";
import { audit } from "@/lib/audit";
import { csvDownload } from "@/lib/csv";
import { isoDay } from "@/lib/dates";

/** GET /api/admin/audit/export?<same filters> → CSV download (audited: audit.export, since the log leaves Riser). */
export const GET = route("admin", async ({ req, viewer }) => {
  const filters = auditQuery.parse(queryOf(req));
  const { csv, rows, truncated } = await auditCsv(filters);
  const { action, actor, organizationId, from, to } = filters;
  await audit({ actor: viewer, organizationId: null, action: "audit.export", targetType: "audit_log", targetId: "export", ip: clientIp(req), details: { rows, truncated, filters: { action, actor, organizationId, from, to } } });
  return csvDownload(`riser-audit-log-${isoDay(new Date())}.csv`, csv, truncated ? { "x-riser-truncated": "1" } : {});
});
