import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Adds the "signoffs" message scope to the module's (lib/i18n/client-namespaces.ts). */
export default function Layout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="signoffs">{children}</ScopedMessages>;
}
