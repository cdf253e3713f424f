import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Certificate verification: adds the "verify" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function VerifyLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="verify">{children}</ScopedMessages>;
}
