import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Modules, lessons, quizzes and sign-offs: adds the "lessons" message scope for the browser (lib/i18n/client-namespaces.ts); the quiz and sign-offs layouts add theirs. */
export default function ModulesLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="lessons">{children}</ScopedMessages>;
}
