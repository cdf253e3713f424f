import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { PeopleConsole } from "@/components/admin/people-console";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { organizationOptions } from "@/lib/admin";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("people.title")} · ${t("title")}` };
}

export default async function AdminPeoplePage() {
  const viewer = await requireViewer("admin", "/admin/people");
  const t = await getTranslations("admin");
  const organizations = await organizationOptions();
  return (
    <>
      <PageTitle title={t("people.title")} lead={t("people.lead")} />
      <PeopleConsole organizations={organizations} viewerId={viewer.id} />
    </>
  );
}
