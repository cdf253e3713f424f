import Link from "next/link";
import { CALCULATOR_CAUTION_TEXT, CALCULATOR_IDS, CALCULATOR_INFO } from "@/lib/hydraulics";
import { PageTitle } from "@/components/ui/page-title";

/** body of /tools: the calculators, each with a line on what it does */
export function ToolsIndex() {
  return (
    <>
      <PageTitle
        title="Calculators"
        lead="Work the numbers behind a home sprinkler design in US or SI units, with every step shown and a printable summary for a training file."
      />
      <ul className="grid gap-4 sm:grid-cols-2">
        {CALCULATOR_IDS.map((id) => (
          <li key={id} className="rounded border border-line bg-panel p-4">
            <h2 className="text-lg font-bold">
              <Link href={`/tools/${id}`}>{CALCULATOR_INFO[id].title}</Link>
            </h2>
            <p className="mt-1 text-muted">{CALCULATOR_INFO[id].summary}</p>
          </li>
        ))}
      </ul>
      <p className="mt-6 max-w-prose rounded border-l-4 border-caution bg-caution-light p-3">{CALCULATOR_CAUTION_TEXT}</p>
    </>
  );
}
