"use client";
import { useTranslations } from "next-intl";
import { ErrorState } from "@/components/shell/route-states";

export default function TeamError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const t = useTranslations("team");
  return <ErrorState error={error} reset={reset} area={t("error.area")} home={{ href: "/team", label: t("error.home") }} />;
}
