import { useTranslations } from "next-intl";
import { isCalculatorId, type CalculatorId } from "@/lib/hydraulics";
import { ElevationCalculator } from "./elevation";
import { FlowTestCalculator } from "./flow-test";
import { FrictionLossCalculator } from "./friction-loss";
import { RoomCoverageCalculator } from "./room-coverage";
import { SprinklerFlowCalculator } from "./sprinkler-flow";
import { StoredWaterCalculator } from "./stored-water";
import { SystemDemandCalculator } from "./system-demand";
import type { CalculatorEmbedProps, CalculatorProps } from "./types";

export const CALCULATOR_COMPONENTS: Record<CalculatorId, (props: CalculatorProps) => React.ReactNode> = {
  "sprinkler-flow": SprinklerFlowCalculator,
  "friction-loss": FrictionLossCalculator,
  elevation: ElevationCalculator,
  "flow-test": FlowTestCalculator,
  "stored-water": StoredWaterCalculator,
  "room-coverage": RoomCoverageCalculator,
  "system-demand": SystemDemandCalculator,
};

/**
 * The MDX embed: `<Calculator id="sprinkler-flow" preset={{ kFactor: 4.9, pressurePsi: 10 }} />`.
 * Preset keys follow the content contract ("Calculator embeds"); an unknown id renders a notice
 * rather than breaking the lesson.
 */
export function Calculator({ id, preset, embedded = true }: CalculatorEmbedProps) {
  const t = useTranslations("tools");
  if (!isCalculatorId(id)) {
    return (
      <p role="alert" className="my-4 rounded border border-caution bg-caution-light p-3 text-caution">
        {t("unknown", { id: String(id) })}
      </p>
    );
  }
  const Component = CALCULATOR_COMPONENTS[id];
  return <Component preset={preset} embedded={embedded} />;
}
