import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** The team pages: adds the "team" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function TeamLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="team">{children}</ScopedMessages>;
}
