import { AdminNav } from "@/components/admin/admin-nav";
import { ScopedMessages } from "@/components/i18n/scoped-messages";
import { requireViewer } from "@/lib/access";

/** Every admin page: admins only (each page checks again), with the section tabs; adds the "admin" message scope for the browser. */
export default async function AdminLayout({ children }: { children: React.ReactNode }) {
  await requireViewer("admin", "/admin");
  return (
    <ScopedMessages scope="admin">
      <AdminNav />
      {children}
    </ScopedMessages>
  );
}
