import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { OrganizationsConsole } from "@/components/admin/organizations-console";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("organizations.title")} · ${t("title")}` };
}

export default async function AdminOrganizationsPage() {
  await requireViewer("admin", "/admin/organizations");
  const t = await getTranslations("admin");
  return (
    <>
      <PageTitle title={t("organizations.title")} lead={t("organizations.lead")} />
      <OrganizationsConsole />
    </>
  );
}
