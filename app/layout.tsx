import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { NextIntlClientProvider } from "next-intl";
import { getLocale, getMessages, getTranslations } from "next-intl/server";
import { BASE_NAMESPACES } from "@/lib/i18n/browser";
import { SiteHeader } from "@/components/shell/site-header";
import { SiteFooter } from "@/components/shell/site-footer";
import { RouteFocus } from "@/components/ui/route-focus";
import { bodyFont, monoFont } from "./fonts";
import "./globals.css";
import { palette } from "@/lib/theme";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("shell");
  return { title: { default: t("siteTitle"), template: "%s · Riser" }, description: t("siteDescription") };
}

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: palette.ink };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request: its scripts carry the nonce of that request's CSP (proxy.ts).
  // Prerendered HTML would hold no nonce, and the policy allows no other inline script.
  await connection();
  const [locale, t, messages] = await Promise.all([getLocale(), getTranslations("shell"), getMessages()]);
  // only the base namespaces travel with every page; sections add theirs with <ScopedMessages>
  // (lib/i18n/client-namespaces.ts)
  const clientMessages = Object.fromEntries(BASE_NAMESPACES.filter((n) => n in messages).map((n) => [n, messages[n]]));
  return (
    <html lang={locale} className={`${bodyFont.variable} ${monoFont.variable}`}>
      <body>
        <NextIntlClientProvider messages={clientMessages}>
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-panel focus:px-3 focus:py-2">
          {t("skipToMain")}
        </a>
        <SiteHeader />
        <main id="main" className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6">
          {children}
        </main>
        <SiteFooter />
        <RouteFocus />
        </NextIntlClientProvider>
      </body>
    </html>
  );
}
