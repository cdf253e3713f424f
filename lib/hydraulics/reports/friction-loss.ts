import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { HydraulicsInputError } from "../errors";
import { fittingsEquivalentLength } from "../fittings";
import { frictionLossBarPerM, frictionLossPsiPerFt, pipeVelocityFtPerS } from "../friction";
import { PIPE_DATA, hazenWilliamsC, pipeDimensions } from "../pipe-data";
import type { FrictionLossReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport, type ReportStep } from "./common";
import { NOMINAL_BORE_NOTE, fittingList, fittingsError } from "./fittings";

const NAMES = { flowGpm: "flow", flowLpm: "flow", cFactor: "cFactor", insideDiameterIn: "insideDiameter", insideDiameterMm: "insideDiameter" };

export function frictionLossReport(input: FrictionLossReportInput): CalculatorReport {
  const { units, material, nominalSize, flow, length, elbows, teeBranches: tees, listedFittingsLength: listed } = input;
  const { insideDiameter: idOverride, cFactor: cOverride } = input;
  const u = unitSet(units);
  const info = PIPE_DATA[material];
  const dims = mapErrors({}, () => pipeDimensions(material, nominalSize));
  const idIn = idOverride === undefined ? dims.insideDiameterIn : toUs("diameter", idOverride, units);
  const c = cOverride ?? hazenWilliamsC(material);
  const fittings = fittingList(elbows, tees, listed, units);
  let fit: ReturnType<typeof fittingsEquivalentLength>;
  try {
    fit = fittingsEquivalentLength(material, nominalSize, fittings, {
      cFactor: cOverride,
      insideDiameterIn: idOverride === undefined ? undefined : idIn,
    });
  } catch (e) {
    if (e instanceof HydraulicsInputError) throw fittingsError(e, fittings, "");
    throw e;
  }
  const flowUs = toUs("flow", flow, units);
  const totalFt = toUs("length", length, units) + fit.totalFt;
  const perUs = mapErrors(NAMES, () => frictionLossPsiPerFt(flowUs, c, idIn));
  const id = fromUs("diameter", idIn, units);
  const fitLen = fromUs("length", fit.totalFt, units);
  const totalLen = fromUs("length", totalFt, units);
  const velocity = fromUs("velocity", pipeVelocityFtPerS(flowUs, idIn), units);

  const constant = units === "si" ? "6.05 × 10⁵" : "4.52";
  const per = units === "si" ? mapErrors(NAMES, () => frictionLossBarPerM(flow, c, id)) : perUs;
  const loss = per * totalLen;
  const plastic = info.wallBasis === "minimum wall";

  const steps: ReportStep[] = [
    idOverride === undefined
      ? {
          label: `Inside diameter (${plastic ? "average bore" : "published ID"}, ${info.dimensionSource.split(" (")[0]})`,
          work: plastic
            ? `OD ${dims.outsideDiameterIn} − 2 × (minimum wall ${dims.wallIn} + half the wall tolerance) — not OD − 2 × minimum wall (${dims.tableWallInsideDiameterIn} in)`
            : `OD ${dims.outsideDiameterIn} − 2 × ${info.wallBasis} ${dims.wallIn} in`,
          text: f(id, u.diameter),
        }
      : { label: "Inside diameter (the pipe's listed value, entered — it governs)", work: "entered", text: f(id, u.diameter) },
  ];
  for (const item of fit.items) {
    steps.push({
      label: `Fittings: ${item.count} × ${item.label}`,
      work:
        item.chartFt === undefined
          ? `${item.count} × ${g(fromUs("length", item.eachFt, units))} ${u.length} (entered)`
          : `${item.count} × ${item.chartFt} ft chart × ${g(item.cMultiplier ?? 1)} for C${item.diameterMultiplier !== 1 ? ` × ${g(item.diameterMultiplier ?? 1)} for the bore` : ""}`,
      text: f(fromUs("length", item.totalFt, units), u.length),
    });
  }
  steps.push(
    { label: "Length with fittings", work: `${g(length)} + ${g(fitLen)}`, text: f(totalLen, u.length) },
    {
      label: "Loss per unit length",
      work: `${constant} × ${g(flow)}^1.85 ÷ (${g(c)}^1.85 × ${g(id)}^4.87)`,
      text: f(per, u.lossPerLength),
    },
    { label: "Friction loss", work: `${g(per)} × ${g(totalLen)}`, text: f(loss, u.pressure, "up") },
    {
      label: "Velocity in the pipe",
      work: units === "si" ? `flow ÷ bore area` : `0.4085 × ${g(flow)} ÷ ${g(id)}²`,
      text: `${g(velocity)} ${u.velocity}`,
    },
  );

  const notes = [
    `Hazen-Williams in the form NFPA 13 prints: ${units === "si" ? "bar per metre with Q in L/min and d in mm" : "psi per foot with Q in gpm and d in inches"}.`,
    `Inside diameter: ${idOverride === undefined ? `${info.boreBasis}; ${info.dimensionSource}` : "entered from the pipe's listing (it governs over the table)"}.`,
    `C = ${c}: ${cOverride === undefined ? info.cFactorSource : "entered"}.`,
    NOMINAL_BORE_NOTE,
  ];
  if (fit.items.some((i) => i.chartFt !== undefined)) {
    notes.push(
      "Fitting lengths: NFPA 13 equivalent schedule 40 steel pipe length chart (C = 120) with its C-factor multiplier; for other bores × (ID ÷ schedule 40 ID)^4.87 (from memory — verify against the adopted edition).",
    );
  }
  if (plastic) notes.push("CPVC and PEX fittings take the pipe maker's listed equivalent lengths; enter their total as listed fittings.");
  if (info.note) notes.push(info.note);

  return {
    id: "friction-loss",
    title: CALCULATOR_INFO["friction-loss"].title,
    units,
    formula: [
      `p = ${constant} × Q^1.85 ÷ (C^1.85 × d^4.87)   (${u.lossPerLength}; Q in ${u.flow}, d in ${u.diameter})`,
      `Friction loss = p × (pipe length + fitting equivalent length)`,
    ],
    inputs: [
      { label: "Pipe", text: `${info.label}, ${nominalSize} in nominal` },
      { label: "Flow", text: f(flow, u.flow) },
      { label: "Pipe length", text: f(length, u.length) },
      ...(elbows ? [{ label: "90° elbows", text: String(elbows) }] : []),
      ...(tees ? [{ label: "Tees, flow turned 90°", text: String(tees) }] : []),
      ...(listed ? [{ label: "Listed fittings, total", text: f(listed, u.length) }] : []),
      ...(idOverride === undefined ? [] : [{ label: "Listed inside diameter", text: f(idOverride, u.diameter) }]),
      { label: "C-factor", text: String(c) },
    ],
    steps,
    results: [
      { label: "Friction loss", text: f(loss, u.pressure, "up"), value: loss, unit: u.pressure },
      { label: "Loss per unit length", text: f(per, u.lossPerLength), value: per, unit: u.lossPerLength },
      { label: "Velocity", text: `${g(velocity)} ${u.velocity}`, value: velocity, unit: null },
      { label: "Inside diameter used", text: f(id, u.diameter), value: id, unit: u.diameter },
    ],
    checks: [],
    notes,
    caution: CALCULATOR_CAUTION_TEXT,
  };
}
