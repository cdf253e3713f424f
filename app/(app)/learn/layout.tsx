import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** The learner's home: adds the "learn" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function LearnLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="learn">{children}</ScopedMessages>;
}
