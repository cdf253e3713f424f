import { clientIp, json, readJson, route } from "@/lib/api";
import { resolveScope, resolveWriteOrg } from "@/lib/access";
import { describeSetting, periodSettingInput, periodSettingOf, setPeriodSetting } from "@/lib/credentials";

/** GET /api/team/reporting-period[?org=] → how the organization totals CE hours (calendar years unless set). */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  const setting = await periodSettingOf(scope.orgId);
  return json({ setting, text: describeSetting(setting) });
});

/** POST /api/team/reporting-period { startYear, startMonth, lengthMonths, org? } → the new setting (audited). */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, periodSettingInput);
  const org = await resolveWriteOrg(viewer, input.org);
  const saved = await setPeriodSetting(viewer, org.orgId, { startYear: input.startYear, startMonth: input.startMonth, lengthMonths: input.lengthMonths }, clientIp(req));
  return json({ ok: true, ...saved, message: `CE hours are now totalled by ${saved.text}.` });
});
