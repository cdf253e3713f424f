import type { Metadata } from "next";
import { ContentStatus } from "@/components/admin/content-status";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "Content · Admin" };

export default async function AdminContentPage() {
  await requireViewer("admin", "/admin/content");
  return (
    <>
      <PageTitle
        title="Content"
        lead="Lessons, code cards and quiz questions live in the repository and are synced into the catalog. Items removed from the content are retired, never deleted, so nobody's records lose their reference."
      />
      <ContentStatus />
    </>
  );
}
