/** The system-demand form's input (neutral keys, US or SI) as the library's US input, and library errors mapped back to form fields. */
import type { PipeSegmentInput, SystemDemandInput } from "../demand";
import { HydraulicsInputError } from "../errors";
import type { FittingInput } from "../fittings";
import type { FlowTest } from "../flow-test";
import type { SegmentReportInput, SystemDemandReportInput } from "../schemas";
import { toUs, type Units } from "../units";
import { fittingList, fittingsError } from "./fittings";
import { englishReportT, type ReportT } from "./text";

function segment(s: SegmentReportInput, units: Units, t: ReportT): { seg: PipeSegmentInput; fittings: FittingInput[] } {
  const fittings = fittingList(s.elbows, s.teeBranches, s.listedFittingsLength, units, t("common.listedFittings"));
  return {
    fittings,
    seg: {
      label: s.label,
      material: s.material,
      nominalSize: s.nominalSize,
      lengthFt: toUs("length", s.length, units),
      elevationChangeFt: s.elevation === undefined ? 0 : toUs("length", s.elevation, units),
      insideDiameterIn: s.insideDiameter === undefined ? undefined : toUs("diameter", s.insideDiameter, units),
      fittings,
    },
  };
}

export interface DemandInputUs {
  input: SystemDemandInput;
  supply: FlowTest | undefined;
  /** maps an error the library raises to the form field it belongs to */
  fieldOf: (e: HydraulicsInputError) => HydraulicsInputError;
}

export function demandInputUs(raw: SystemDemandReportInput, t: ReportT = englishReportT): DemandInputUs {
  const { units } = raw;
  const segFittings: FittingInput[][] = [];
  const branchFittings: (FittingInput[] | undefined)[] = [];
  const input: SystemDemandInput = {
    sprinklers: raw.sprinklers.map((s, i) => {
      const branch = s.branch ? segment(s.branch, units, t) : undefined;
      branchFittings[i] = branch?.fittings;
      return {
        label: s.label,
        kFactor: toUs("k", s.k, units),
        minFlowGpm: toUs("flow", s.minFlow, units),
        minPressurePsi: s.minPressure === undefined ? undefined : toUs("pressure", s.minPressure, units),
        coverageAreaSqFt: s.coverageArea === undefined ? undefined : toUs("area", s.coverageArea, units),
        branch: branch ? [branch.seg] : undefined,
      };
    }),
    supplyPath: raw.segments.map((s, i) => {
      const r = segment(s, units, t);
      segFittings[i] = r.fittings;
      return r.seg;
    }),
    deviceLosses: (raw.devices ?? []).map((d, i) => ({ label: d.label ?? t("systemDemand.device", { number: String(i + 1) }), lossPsi: toUs("pressure", d.loss, units) })),
    additionalFlowGpm: raw.additionalFlow === undefined ? undefined : toUs("flow", raw.additionalFlow, units),
  };
  const supply: FlowTest | undefined = raw.supply && {
    staticPsi: toUs("pressure", raw.supply.staticPressure, units),
    residualPsi: toUs("pressure", raw.supply.residualPressure, units),
    testFlowGpm: toUs("flow", raw.supply.testFlow, units),
  };

  const simple: Record<string, string> = {
    lengthFt: "length",
    elevationChangeFt: "elevation",
    material: "material",
    nominalSize: "nominalSize",
    flowGpm: "length",
    insideDiameterIn: "insideDiameter",
  };
  const fieldOf = (e: HydraulicsInputError): HydraulicsInputError => {
    // supplyPath[i]… → segments[i]…, sprinklers[i].branch[0]… → sprinklers[i].branch…
    const seg = /^supplyPath\[(\d+)\]\.(.*)$/.exec(e.field);
    const br = /^sprinklers\[(\d+)\]\.branch\[0\]\.(.*)$/.exec(e.field);
    const spr = /^sprinklers\[(\d+)\]\.(\w+)$/.exec(e.field);
    if (seg) {
      const i = Number(seg[1]);
      const rest = seg[2] ?? "";
      if (rest.startsWith("fittings")) return fittingsError(e, segFittings[i] ?? [], `segments[${i}].`);
      return new HydraulicsInputError(`segments[${i}].${simple[rest] ?? rest}`, e.reason);
    }
    if (br) {
      const i = Number(br[1]);
      const rest = br[2] ?? "";
      if (rest.startsWith("fittings")) return fittingsError(e, branchFittings[i] ?? [], `sprinklers[${i}].branch.`);
      return new HydraulicsInputError(`sprinklers[${i}].branch.${simple[rest] ?? rest}`, e.reason);
    }
    if (spr) {
      const names: Record<string, string> = { kFactor: "k", minFlowGpm: "minFlow", minPressurePsi: "minPressure", coverageAreaSqFt: "coverageArea" };
      return new HydraulicsInputError(`sprinklers[${spr[1]}].${names[spr[2] ?? ""] ?? spr[2]}`, e.reason);
    }
    const dev = /^deviceLosses\[(\d+)\]\.lossPsi$/.exec(e.field);
    if (dev) return new HydraulicsInputError(`devices[${dev[1]}].loss`, e.reason);
    const top: Record<string, string> = { additionalFlowGpm: "additionalFlow" };
    return new HydraulicsInputError(top[e.field] ?? e.field, e.reason);
  };
  return { input, supply, fieldOf };
}
