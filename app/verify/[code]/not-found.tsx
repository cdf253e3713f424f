import Link from "next/link";
import { useTranslations } from "next-intl";

export default function CertificateNotFound() {
  const t = useTranslations("verify");
  return (
    <div className="max-w-prose" data-testid="certificate-not-found">
      <h1 className="text-3xl">{t("notFoundTitle")}</h1>
      <p className="mt-3">{t("notFoundBody")}</p>
      <p className="mt-3">{t("notFoundAdvice")}</p>
      <p className="mt-3">
        <Link href="/verify">{t("typeCode")}</Link>
      </p>
    </div>
  );
}
