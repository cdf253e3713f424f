import type { Metadata } from "next";
import { OrganizationsConsole } from "@/components/admin/organizations-console";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "Organizations · Admin" };

export default async function AdminOrganizationsPage() {
  await requireViewer("admin", "/admin/organizations");
  return (
    <>
      <PageTitle title="Organizations" lead="Sprinkler contractors and home builders on this instance, with their training seats and how many people each has." />
      <OrganizationsConsole />
    </>
  );
}
