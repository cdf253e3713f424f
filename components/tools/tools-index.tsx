import Link from "next/link";
import { useTranslations } from "next-intl";
import { CALCULATOR_IDS } from "@/lib/hydraulics";
import { PageTitle } from "@/components/ui/page-title";

/** body of /tools: the calculators, each with a line on what it does */
export function ToolsIndex() {
  const t = useTranslations("tools");
  return (
    <>
      <PageTitle
        title={t("indexTitle")}
        lead={t("indexLead")}
      />
      <ul className="grid gap-4 sm:grid-cols-2">
        {CALCULATOR_IDS.map((id) => (
          <li key={id} className="rounded border border-line bg-panel p-4">
            <h2 className="text-lg font-bold">
              <Link href={`/tools/${id}`}>{t(`info.${id}.title`)}</Link>
            </h2>
            <p className="mt-1 text-muted">{t(`info.${id}.summary`)}</p>
          </li>
        ))}
      </ul>
      <p className="mt-6 max-w-prose rounded border-l-4 border-caution bg-caution-light p-3">{t("caution")}</p>
    </>
  );
}
