import { useTranslations } from "next-intl";
import { isCalculatorId, type CalculatorId } from "@/lib/hydraulics/browser";
import { ElevationCalculator } from "./elevation";
import { FlowTestCalculator } from "./flow-test";
import { FrictionLossCalculator } from "./friction-loss";
import { RoomCoverageCalculator } from "./room-coverage";
import { SprinklerFlowCalculator } from "./sprinkler-flow";
import { StoredWaterCalculator } from "./stored-water";
import { SystemDemandCalculator } from "./system-demand";
import type { CalculatorProps, InitialCalculator } from "./types";

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
 * One calculator by id, started from its first state worked out on the server
 * (./initial-state.ts). An unknown id (a lesson's typo) renders a notice rather than breaking the lesson.
 */
export function Calculator({ id, initial, embedded = true }: { id: CalculatorId | string; initial?: InitialCalculator; embedded?: boolean }) {
  const t = useTranslations("tools");
  if (!isCalculatorId(id) || !initial) {
    return (
      <p role="alert" className="my-4 rounded border border-caution bg-caution-light p-3 text-caution">
        {t("unknown", { id: String(id) })}
      </p>
    );
  }
  const Component = CALCULATOR_COMPONENTS[id];
  return <Component initial={initial} embedded={embedded} />;
}
