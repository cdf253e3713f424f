import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { ContentStatus } from "@/components/admin/content-status";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { contentStatus } from "@/lib/admin";
import { asJson } from "@/components/ui/server-first";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("content.title")} · ${t("title")}` };
}

export default async function AdminContentPage() {
  await requireViewer("admin", "/admin/content");
  const t = await getTranslations("admin");
  const status = asJson<Awaited<ReturnType<typeof contentStatus>>>(await contentStatus());
  return (
    <>
      <PageTitle
        title={t("content.title")}
        lead={t("content.lead")}
      />
      <ContentStatus initial={status} />
    </>
  );
}
