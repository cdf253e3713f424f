import { getMessages } from "next-intl/server";
import { SCOPED_NAMESPACES, type MessageScope } from "@/lib/i18n/browser";
import { MergeMessages } from "./merge-messages";

/**
 * Adds one scope's catalog namespaces (lib/i18n/client-namespaces.ts) to the messages the browser
 * components below it can read. Only those namespaces travel with the page; the ones already sent
 * by the providers around it are merged in the browser, not sent twice.
 */
export async function ScopedMessages({ scope, children }: { scope: MessageScope; children: React.ReactNode }) {
  const messages = await getMessages();
  const own = Object.fromEntries(SCOPED_NAMESPACES[scope].filter((n) => n in messages).map((n) => [n, messages[n]]));
  return <MergeMessages messages={own}>{children}</MergeMessages>;
}
