import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Search: adds the "search" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function SearchLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="search">{children}</ScopedMessages>;
}
