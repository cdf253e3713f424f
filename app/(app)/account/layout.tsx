import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** The account pages: adds the "account" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function AccountLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="account">{children}</ScopedMessages>;
}
