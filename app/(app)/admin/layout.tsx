import { AdminNav } from "@/components/admin/admin-nav";
import { requireViewer } from "@/lib/access";

/** Every admin page: admins only (each page checks again), with the section tabs. */
export default async function AdminLayout({ children }: { children: React.ReactNode }) {
  await requireViewer("admin", "/admin");
  return (
    <>
      <AdminNav />
      {children}
    </>
  );
}
