import Link from "next/link";
import { useTranslations } from "next-intl";
import { isCalculatorId, type CalculatorId } from "@/lib/hydraulics";
import { PageTitle } from "@/components/ui/page-title";
import { Calculator } from "./calculator";

/** body of /tools/[calculator]; the route calls notFound() when `isCalculatorId(params.calculator)` is false */
export function CalculatorPage({ id }: { id: CalculatorId }) {
  const t = useTranslations("tools");
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/tools">{t("allCalculators")}</Link>
      </p>
      <PageTitle title={t(`info.${id}.title`)} lead={t(`info.${id}.summary`)} />
      <Calculator id={id} embedded={false} />
    </>
  );
}

export { isCalculatorId };
