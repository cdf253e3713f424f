import Link from "next/link";
import { useTranslations } from "next-intl";

export default function Forbidden() {
  const t = useTranslations("system");
  return (
    <div className="max-w-prose">
      <h1 className="text-3xl">{t("forbiddenTitle")}</h1>
      <p className="mt-3">{t("forbiddenBody")}</p>
      <p className="mt-3"><Link href="/learn">{t("backToTraining")}</Link></p>
    </div>
  );
}
