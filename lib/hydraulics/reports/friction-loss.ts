import { HydraulicsInputError } from "../errors";
import { FITTING_LABELS, fittingsEquivalentLength } from "../fittings";
import { frictionLossBarPerM, frictionLossPsiPerFt, pipeVelocityFtPerS } from "../friction";
import { PIPE_DATA, hazenWilliamsC, pipeDimensions } from "../pipe-data";
import type { FrictionLossReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport, type ReportStep } from "./common";
import { fittingList, fittingsError } from "./fittings";
import { englishReportT, type ReportT } from "./text";

const NAMES = { flowGpm: "flow", flowLpm: "flow", cFactor: "cFactor", insideDiameterIn: "insideDiameter", insideDiameterMm: "insideDiameter" };

/** the fitting names the form offers, in the report's language (other names are the library's) */
function fittingName(label: string, t: ReportT) {
  if (label === FITTING_LABELS["elbow-90"]) return t("common.elbow90");
  if (label === FITTING_LABELS["tee-branch"]) return t("common.teeBranch");
  return label;
}

export function frictionLossReport(input: FrictionLossReportInput, t: ReportT = englishReportT): CalculatorReport {
  const { units, material, nominalSize, flow, length, elbows, teeBranches: tees, listedFittingsLength: listed } = input;
  const { insideDiameter: idOverride, cFactor: cOverride } = input;
  const u = unitSet(units);
  const info = PIPE_DATA[material];
  const dims = mapErrors({}, () => pipeDimensions(material, nominalSize));
  const idIn = idOverride === undefined ? dims.insideDiameterIn : toUs("diameter", idOverride, units);
  const c = cOverride ?? hazenWilliamsC(material);
  const fittings = fittingList(elbows, tees, listed, units, t("common.listedFittings"));
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
          label: t("frictionLoss.idLabel", {
            basis: plastic ? t("frictionLoss.averageBore") : t("frictionLoss.publishedId"),
            source: t(`pipe.${material}.dimensionSource`).split(" (")[0] ?? "",
          }),
          work: plastic
            ? t("frictionLoss.idWorkPlastic", {
                od: String(dims.outsideDiameterIn),
                wall: String(dims.wallIn),
                tableId: String(dims.tableWallInsideDiameterIn),
              })
            : t("frictionLoss.idWork", { od: String(dims.outsideDiameterIn), wallBasis: t(plastic ? "wallBasis.minimum" : "wallBasis.nominal"), wall: String(dims.wallIn) }),
          text: f(id, u.diameter),
        }
      : { label: t("frictionLoss.idEntered"), work: t("common.entered"), text: f(id, u.diameter) },
  ];
  for (const item of fit.items) {
    steps.push({
      label: t("frictionLoss.fittingsLabel", { count: String(item.count), fitting: fittingName(item.label, t) }),
      work:
        item.chartFt === undefined
          ? t("frictionLoss.fittingsWorkEntered", { count: String(item.count), each: g(fromUs("length", item.eachFt, units)), unit: u.length })
          : t("frictionLoss.fittingsWorkChart", {
              count: String(item.count),
              chart: String(item.chartFt),
              cMultiplier: g(item.cMultiplier ?? 1),
              bore: item.diameterMultiplier !== 1 ? t("frictionLoss.fittingsWorkBore", { multiplier: g(item.diameterMultiplier ?? 1) }) : "",
            }),
      text: f(fromUs("length", item.totalFt, units), u.length),
    });
  }
  steps.push(
    { label: t("frictionLoss.lengthWithFittings"), work: `${g(length)} + ${g(fitLen)}`, text: f(totalLen, u.length) },
    {
      label: t("frictionLoss.lossPerLength"),
      work: `${constant} × ${g(flow)}^1.85 ÷ (${g(c)}^1.85 × ${g(id)}^4.87)`,
      text: f(per, u.lossPerLength),
    },
    { label: t("frictionLoss.frictionLoss"), work: `${g(per)} × ${g(totalLen)}`, text: f(loss, u.pressure, "up") },
    {
      label: t("frictionLoss.velocityInPipe"),
      work: units === "si" ? t("frictionLoss.velocityWorkSi") : `0.4085 × ${g(flow)} ÷ ${g(id)}²`,
      text: `${g(velocity)} ${u.velocity}`,
    },
  );

  const notes = [
    t("frictionLoss.noteHazen", { form: units === "si" ? t("frictionLoss.hazenSi") : t("frictionLoss.hazenUs") }),
    t("frictionLoss.noteId", {
      text: idOverride === undefined ? `${t(`pipe.${material}.boreBasis`)}; ${t(`pipe.${material}.dimensionSource`)}` : t("frictionLoss.noteIdEntered"),
    }),
    t("frictionLoss.noteC", { c: String(c), source: cOverride === undefined ? t(`pipe.${material}.cFactorSource`) : t("common.entered") }),
    t("common.nominalBore"),
  ];
  if (fit.items.some((i) => i.chartFt !== undefined)) {
    notes.push(
      t("frictionLoss.noteFittings"),
    );
  }
  if (plastic) notes.push(t("frictionLoss.notePlastic"));
  if (info.note) notes.push(t(`pipe.${material}.note`));

  return {
    id: "friction-loss",
    title: t("title.friction-loss"),
    units,
    formula: [
      t("frictionLoss.formulaLoss", { constant, lossUnit: u.lossPerLength, flowUnit: u.flow, diameterUnit: u.diameter }),
      t("frictionLoss.formulaTotal"),
    ],
    inputs: [
      { label: t("frictionLoss.pipe"), text: t("frictionLoss.pipeText", { material: t(`material.${material}`), size: nominalSize }) },
      { label: t("frictionLoss.flow"), text: f(flow, u.flow) },
      { label: t("frictionLoss.pipeLength"), text: f(length, u.length) },
      ...(elbows ? [{ label: t("frictionLoss.elbows"), text: String(elbows) }] : []),
      ...(tees ? [{ label: t("frictionLoss.tees"), text: String(tees) }] : []),
      ...(listed ? [{ label: t("frictionLoss.listedTotal"), text: f(listed, u.length) }] : []),
      ...(idOverride === undefined ? [] : [{ label: t("frictionLoss.listedId"), text: f(idOverride, u.diameter) }]),
      { label: t("frictionLoss.cFactor"), text: String(c) },
    ],
    steps,
    results: [
      { label: t("frictionLoss.frictionLoss"), text: f(loss, u.pressure, "up"), value: loss, unit: u.pressure },
      { label: t("frictionLoss.lossPerLength"), text: f(per, u.lossPerLength), value: per, unit: u.lossPerLength },
      { label: t("frictionLoss.velocity"), text: `${g(velocity)} ${u.velocity}`, value: velocity, unit: null },
      { label: t("frictionLoss.idUsed"), text: f(id, u.diameter), value: id, unit: u.diameter },
    ],
    checks: [],
    notes,
    caution: t("common.caution"),
  };
}
