import type { Metadata } from "next";
import { AuditLog } from "@/components/admin/audit-log";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { organizationOptions } from "@/lib/admin";

export const metadata: Metadata = { title: "Audit log · Admin" };

export default async function AdminAuditPage() {
  await requireViewer("admin", "/admin/audit");
  const organizations = await organizationOptions();
  return (
    <>
      <PageTitle title="Audit log" lead="Who did what to what, when, and from which address. Entries are never changed or removed." />
      <AuditLog organizations={organizations} />
    </>
  );
}
