import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Certificates: adds the "certificates" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function CertificatesLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="certificates">{children}</ScopedMessages>;
}
