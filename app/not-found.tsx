import Link from "next/link";
import { useTranslations } from "next-intl";

export default function NotFound() {
  const t = useTranslations("system");
  return (
    <div className="max-w-prose">
      <h1 className="text-3xl">{t("notFoundTitle")}</h1>
      <p className="mt-3">{t("notFoundBody")}</p>
      <p className="mt-3"><Link href="/">{t("home")}</Link></p>
    </div>
  );
}
