import { ScopedMessages } from "@/components/i18n/scoped-messages";
import { CalculatorEmbedLazy } from "./calculator-embed-lazy";
import type { CalculatorEmbedProps } from "./types";

/**
 * A calculator in a lesson or card: the calculators' words travel only with pages that show one
 * (the "tools" message scope), and the calculator itself loads lazily (./calculator-embed-lazy).
 */
export function CalculatorEmbed(props: CalculatorEmbedProps) {
  return (
    <ScopedMessages scope="tools">
      <CalculatorEmbedLazy {...props} />
    </ScopedMessages>
  );
}
