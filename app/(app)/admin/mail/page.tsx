import type { Metadata } from "next";
import { MailLog } from "@/components/admin/mail-log";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { mailBodiesVisible } from "@/lib/admin";

export const metadata: Metadata = { title: "Mail log · Admin" };

export default async function AdminMailPage() {
  await requireViewer("admin", "/admin/mail");
  return (
    <>
      <PageTitle title="Mail log" lead="Every message Riser sent or tried to send, newest first." />
      <MailLog bodiesVisible={mailBodiesVisible()} />
    </>
  );
}
