import type { Metadata } from "next";
import { PeopleConsole } from "@/components/admin/people-console";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { organizationOptions } from "@/lib/admin";

export const metadata: Metadata = { title: "People · Admin" };

export default async function AdminPeoplePage() {
  const viewer = await requireViewer("admin", "/admin/people");
  const organizations = await organizationOptions();
  return (
    <>
      <PageTitle title="People" lead="Everyone on this instance, across organizations. Role changes and bans need a reason; every change goes into the audit log." />
      <PeopleConsole organizations={organizations} viewerId={viewer.id} />
    </>
  );
}
