import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** The calculators: adds the "tools" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function ToolsLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="tools">{children}</ScopedMessages>;
}
