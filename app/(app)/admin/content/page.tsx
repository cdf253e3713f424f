import type { Metadata } from "next";
import { ContentStatus } from "@/components/admin/content-status";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { contentStatus } from "@/lib/admin";
import { asJson } from "@/components/ui/server-first";

export const metadata: Metadata = { title: "Content · Admin" };

export default async function AdminContentPage() {
  await requireViewer("admin", "/admin/content");
  const status = asJson<Awaited<ReturnType<typeof contentStatus>>>(await contentStatus());
  return (
    <>
      <PageTitle
        title="Content"
        lead="Lessons, code cards and quiz questions live in the repository and are synced into the catalog. Items removed from the content are retired, never deleted, so nobody's records lose their reference."
      />
      <ContentStatus initial={status} />
    </>
  );
}
