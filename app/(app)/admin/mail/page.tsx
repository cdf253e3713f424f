import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { MailLog } from "@/components/admin/mail-log";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { mailBodiesVisible } from "@/lib/admin";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("mail.title")} · ${t("title")}` };
}

export default async function AdminMailPage() {
  await requireViewer("admin", "/admin/mail");
  const t = await getTranslations("admin");
  return (
    <>
      <PageTitle title={t("mail.title")} lead={t("mail.lead")} />
      <MailLog bodiesVisible={mailBodiesVisible()} />
    </>
  );
}
