import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Reference cards (written with the lesson components): adds the "lessons" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function ReferenceLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="lessons">{children}</ScopedMessages>;
}
