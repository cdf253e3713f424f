import { ScopedMessages } from "@/components/i18n/scoped-messages";

/** Sign-in, sign-up, password reset and invitations: adds the "auth" message scope for the browser (lib/i18n/client-namespaces.ts). */
export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return <ScopedMessages scope="auth">{children}</ScopedMessages>;
}
