/** The calculators Riser offers: ids, titles, one-line summaries and the caution every one shows. */

export const CALCULATOR_CAUTION_TEXT =
  "A teaching and checking aid, not a stamped design: the sprinkler's listing, the adopted code with its local amendments and the authority having jurisdiction govern.";

export const CALCULATOR_IDS = [
  "sprinkler-flow",
  "friction-loss",
  "elevation",
  "flow-test",
  "stored-water",
  "room-coverage",
  "system-demand",
] as const;
export type CalculatorId = (typeof CALCULATOR_IDS)[number];
export const isCalculatorId = (v: unknown): v is CalculatorId =>
  typeof v === "string" && (CALCULATOR_IDS as readonly string[]).includes(v);

export const CALCULATOR_INFO: Record<CalculatorId, { title: string; summary: string }> = {
  "sprinkler-flow": {
    title: "Sprinkler flow and pressure",
    summary: "Flow from a sprinkler's K-factor at a pressure, or the pressure it needs for a flow.",
  },
  "friction-loss": {
    title: "Friction loss in pipe",
    summary: "Hazen-Williams loss for a run of copper, CPVC, PEX or steel pipe, fittings included.",
  },
  elevation: { title: "Elevation pressure", summary: "Pressure lost lifting water to a sprinkler above the gauge." },
  "flow-test": {
    title: "Hydrant flow test",
    summary: "Pressure the main offers at your design flow, from static, residual and test-flow readings.",
  },
  "stored-water": { title: "Stored water", summary: "Tank volume for a design flow held for the design duration." },
  "room-coverage": {
    title: "Room coverage",
    summary: "Fewest sprinklers in a regular grid for a room, against a listing's spacing and area.",
  },
  "system-demand": {
    title: "System demand",
    summary: "Flow and pressure needed at the source for the design sprinklers, step by step.",
  },
};
