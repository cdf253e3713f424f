/** Default inputs for each calculator, and lesson presets (the content contract's US keys) mapped onto them. */
import type { CalculatorId } from "./catalog";
import { NOMINAL_SIZES, PIPE_MATERIALS, type NominalSize, type PipeMaterial } from "./pipe-data";
import type { CalculatorInputs, SystemDemandReportInput } from "./schemas";

/**
 * An invented example system (Quillmoor Fire Protection on a Larkhaven Homes plan, Juniper Flats).
 * About 27.4 gpm runs through the meter, so the example uses a 1 in meter: AWWA C700 gives a 1 in
 * displacement meter a safe maximum operating capacity of 50 gpm with at most 15 psi loss there
 * (a 5/8 × 3/4 in meter: 20 gpm — too small for this flow) (from memory — verify against the
 * adopted C700 edition and the meter maker's curve). Loss grows with flow squared, so at 27 gpm
 * the 1 in meter loses at most 15 × (27.4 ÷ 50)² ≈ 4.5 psi, entered as 4.6 psi (rounded up); the maker's curve governs.
 */
export const EXAMPLE_SYSTEM_DEMAND: SystemDemandReportInput = {
  units: "us",
  sprinklers: [
    {
      label: "Great room, far sprinkler",
      k: 4.9,
      minFlow: 13,
      coverageArea: 256,
      branch: { label: "Branch to far sprinkler", material: "cpvc", nominalSize: "3/4", length: 22, listedFittingsLength: 7 },
    },
    {
      label: "Great room, near sprinkler",
      k: 4.9,
      minFlow: 13,
      coverageArea: 256,
      branch: { label: "Branch to near sprinkler", material: "cpvc", nominalSize: "3/4", length: 6, listedFittingsLength: 4 },
    },
  ],
  segments: [
    { label: "Water service", material: "copper-k", nominalSize: "1", length: 55, elevation: 3, elbows: 2 },
    { label: "Riser and attic main", material: "cpvc", nominalSize: "1", length: 48, elevation: 14, listedFittingsLength: 19 },
  ],
  devices: [
    { label: "Water meter (1 in; loss at the design flow, maker's curve)", loss: 4.6 },
    { label: "Backflow preventer (maker's curve)", loss: 4 },
  ],
  supply: { staticPressure: 68, residualPressure: 55, testFlow: 1000 },
};

/** default inputs for each calculator, or a lesson preset (US keys of the content contract) mapped onto them */
export function inputFromPreset<I extends CalculatorId>(id: I, preset?: Record<string, unknown>): CalculatorInputs[I] {
  const p = preset ?? {};
  const n = (key: string, fallback: number) => (typeof p[key] === "number" && Number.isFinite(p[key]) ? (p[key] as number) : fallback);
  const defaults: { [K in CalculatorId]: () => CalculatorInputs[K] } = {
    "sprinkler-flow": () =>
      typeof p.flowGpm === "number" && typeof p.pressurePsi !== "number"
        ? { units: "us", solveFor: "pressure", k: n("kFactor", 4.9), flow: n("flowGpm", 13), pressure: 7 }
        : { units: "us", solveFor: "flow", k: n("kFactor", 4.9), pressure: n("pressurePsi", 10), flow: 13 },
    "friction-loss": () => ({
      units: "us",
      material: (PIPE_MATERIALS as readonly unknown[]).includes(p.material) ? (p.material as PipeMaterial) : "copper-l",
      nominalSize: (NOMINAL_SIZES as readonly unknown[]).includes(p.nominalSize) ? (p.nominalSize as NominalSize) : "1",
      flow: n("flowGpm", 26),
      length: n("lengthFt", 50),
    }),
    elevation: () => ({ units: "us", height: n("heightFt", 18) }),
    "flow-test": () => ({
      units: "us",
      staticPressure: n("staticPsi", 65),
      residualPressure: n("residualPsi", 50),
      testFlow: n("testFlowGpm", 900),
      demandFlow: n("demandFlowGpm", 26),
    }),
    "stored-water": () => ({ units: "us", flow: n("flowGpm", 26), duration: n("durationMin", 10) }),
    "room-coverage": () => ({
      units: "us",
      length: n("lengthFt", 18),
      width: n("widthFt", 14),
      maxSpacing: n("maxSpacingFt", 16),
      maxArea: n("maxAreaSqFt", 256),
    }),
    "system-demand": () => structuredClone(EXAMPLE_SYSTEM_DEMAND),
  };
  return defaults[id]() as CalculatorInputs[I];
}
