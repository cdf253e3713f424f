import { ScopedMessages } from "@/components/i18n/scoped-messages";
import { isCalculatorId } from "@/lib/hydraulics/browser";
import { CalculatorEmbedLazy } from "./calculator-embed-lazy";
import { initialCalculator } from "./initial-state";
import type { CalculatorEmbedProps } from "./types";

/**
 * The MDX embed: `<Calculator id="sprinkler-flow" preset={{ kFactor: 4.9, pressurePsi: 10 }} />`.
 * Preset keys follow the content contract ("Calculator embeds"). The calculators' words travel only
 * with pages that show one (the "tools" message scope), the first result is worked out here on the
 * server, and the calculator itself loads lazily (./calculator-embed-lazy).
 */
export async function CalculatorEmbed({ id, preset, embedded = true }: CalculatorEmbedProps) {
  const initial = isCalculatorId(id) ? await initialCalculator(id, preset) : undefined;
  return (
    <ScopedMessages scope="tools">
      <CalculatorEmbedLazy id={id} initial={initial} embedded={embedded} />
    </ScopedMessages>
  );
}
