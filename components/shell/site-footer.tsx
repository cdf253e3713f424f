import Link from "next/link";
import { getTranslations } from "next-intl/server";

export async function SiteFooter() {
  const t = await getTranslations("shell");
  return (
    <footer className="mt-12 border-t border-line bg-panel">
      <div className="mx-auto max-w-6xl px-4 py-6 text-sm text-muted sm:px-6">
        <p>{t("footerGovern")}</p>
        <p className="mt-2">
          <Link href="/verify">{t("verifyLink")}</Link>
        </p>
      </div>
    </footer>
  );
}
