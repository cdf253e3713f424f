import Link from "next/link";
import { CALCULATOR_INFO, isCalculatorId, type CalculatorId } from "@/lib/hydraulics";
import { PageTitle } from "@/components/ui/page-title";
import { Calculator } from "./calculator";

/** body of /tools/[calculator]; the route calls notFound() when `isCalculatorId(params.calculator)` is false */
export function CalculatorPage({ id }: { id: CalculatorId }) {
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/tools">← All calculators</Link>
      </p>
      <PageTitle title={CALCULATOR_INFO[id].title} lead={CALCULATOR_INFO[id].summary} />
      <Calculator id={id} embedded={false} />
    </>
  );
}

export { isCalculatorId };
