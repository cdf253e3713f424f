import { ApiError, clientIp, json, route } from "@/lib/api";
import { importRoster, orgDefaultLanguage, readUpload } from "@/lib/team";
import { isLocale } from "@/lib/i18n/browser";
import { getTranslations } from "next-intl/server";
import { resolveWriteOrg } from "@/lib/access";

/**
 * POST /api/team/invites/import (multipart: file, fileHash from the preview, org? for admins) →
 * checks every row again and writes all valid rows in one transaction; invitation mails follow.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const { bytes, fileName, form } = await readUpload(req);
  const fileHash = form.get("fileHash");
  if (typeof fileHash !== "string" || !/^[0-9a-f]{64}$/.test(fileHash)) throw new ApiError(400, "Preview the file first, then import it.");
  const org = await resolveWriteOrg(viewer, (form.get("org") as string | null) || new URL(req.url).searchParams.get("org"));
  const chosen = form.get("language");
  if (chosen !== null && chosen !== "" && !isLocale(chosen)) throw new ApiError(400, "Some fields need attention.", { language: ["Choose English or Español"] });
  const language = isLocale(chosen) ? chosen : await orgDefaultLanguage(org.orgId);
  const result = await importRoster(viewer, org, bytes, fileName, fileHash, clientIp(req), language);
  const t = await getTranslations("teamApi");
  return json({ ok: true, ...result, message: t("importDone", { imported: result.imported, skipped: result.skipped }) }, 201);
});
