import "server-only";
/**
 * An organization's reporting period for CE hours (./period): read, and changed by its managers or an
 * admin with the change and its audit row in one transaction.
 */
import { db } from "@/db/client";
import { creditReportingPeriod } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { describeSetting, type PeriodSetting } from "./period";
export { periodSettingInput } from "./period-input";
import { periodSettingOf } from "./history";

export async function setPeriodSetting(viewer: Viewer, organizationId: string, s: PeriodSetting, ip: string | null): Promise<{ setting: PeriodSetting; text: string }> {
  const before = await periodSettingOf(organizationId);
  await db.transaction(async (tx) => {
    await tx
      .insert(creditReportingPeriod)
      .values({ organizationId, ...s, updatedAt: new Date(), updatedBy: viewer.id })
      .onDuplicateKeyUpdate({ set: { startYear: s.startYear, startMonth: s.startMonth, lengthMonths: s.lengthMonths, updatedAt: new Date(), updatedBy: viewer.id } });
    await audit(
      {
        actor: viewer,
        organizationId,
        action: "organization.reporting-period",
        targetType: "organization",
        targetId: organizationId,
        ip,
        details: { before, after: s },
      },
      tx,
    );
  });
  return { setting: s, text: describeSetting(s) };
}
