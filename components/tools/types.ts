import type { CalculatorId } from "@/lib/hydraulics";

export interface CalculatorProps {
  /** a lesson's worked example, with the content contract's US keys (e.g. { kFactor: 4.9, pressurePsi: 10 }) */
  preset?: Record<string, unknown>;
  /** inside a lesson: smaller heading */
  embedded?: boolean;
}

export interface CalculatorEmbedProps extends CalculatorProps {
  id: CalculatorId | string;
}
