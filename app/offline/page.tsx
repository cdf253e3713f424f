import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { OfflineOverview } from "@/components/offline/offline-overview";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("offline"))("title") };
}

/**
 * /offline: what this phone keeps and what waits to be sent. The page itself holds nothing personal
 * (the list is read from the phone's own storage), so it is static; the service worker precaches it
 * and shows it for any page opened offline that needs a connection.
 */
export default function OfflinePage() {
  return <OfflineOverview />;
}
