import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { AuditLog } from "@/components/admin/audit-log";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { organizationOptions } from "@/lib/admin";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("audit.title")} · ${t("title")}` };
}

export default async function AdminAuditPage() {
  await requireViewer("admin", "/admin/audit");
  const t = await getTranslations("admin");
  const organizations = await organizationOptions();
  return (
    <>
      <PageTitle title={t("audit.title")} lead={t("audit.lead")} />
      <AuditLog organizations={organizations} />
    </>
  );
}
