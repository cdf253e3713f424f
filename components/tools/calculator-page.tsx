import Link from "next/link";
import { getTranslations } from "next-intl/server";
import { isCalculatorId, type CalculatorId } from "@/lib/hydraulics";
import { PageTitle } from "@/components/ui/page-title";
import { Calculator } from "./calculator";
import { initialCalculator } from "./initial-state";

/** body of /tools/[calculator]; the route calls notFound() when `isCalculatorId(params.calculator)` is false */
export async function CalculatorPage({ id }: { id: CalculatorId }) {
  const [t, initial] = await Promise.all([getTranslations("tools"), initialCalculator(id)]);
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/tools">{t("allCalculators")}</Link>
      </p>
      <PageTitle title={t(`info.${id}.title`)} lead={t(`info.${id}.summary`)} />
      <Calculator id={id} initial={initial} embedded={false} />
    </>
  );
}

export { isCalculatorId };
