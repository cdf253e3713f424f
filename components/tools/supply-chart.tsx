"use client";
import { useTranslations } from "next-intl";

import { CartesianGrid, ComposedChart, Line, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { formatForDisplay, type ReportChart } from "@/lib/hydraulics";

// palette from tailwind.config.ts
const WATER = "#1B617A";
const COPPER = "#9A4F12";
const INK = "#14202B";
const LINE = "#D5CFC3";

/** round numbers for axis ticks: 0 … max in about five steps of 1, 2 or 5 × 10ⁿ */
function niceTicks(max: number): number[] {
  if (!(max > 0)) return [0];
  const raw = max / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? 10 * p;
  const ticks: number[] = [];
  for (let t = 0; t <= max + step * 1e-9; t += step) ticks.push(Number(t.toPrecision(12)));
  if (ticks[ticks.length - 1]! < max) ticks.push(Number((ticks[ticks.length - 1]! + step).toPrecision(12)));
  return ticks;
}

/**
 * The water supply curve from a flow test, with the system's demand point. The flow axis is sized to
 * the design flow (lib/hydraulics sets chart.flowMax), so a home's demand sits inside the chart
 * rather than squashed against the axis; point labels sit to the inside of their dot, never over
 * an axis tick, and the margins leave room for every label.
 */
export function SupplyChart({ chart, verdict }: { chart: ReportChart; verdict?: "pass" | "short" }) {
  const t = useTranslations("tools");
  const fmtP = (v: number) => formatForDisplay(v, chart.pressureUnit);
  const fmtQ = (v: number) => formatForDisplay(v, chart.flowUnit);
  const first = chart.supply[0];
  const xTicks = niceTicks(chart.flowMax);
  const xMax = xTicks[xTicks.length - 1] ?? chart.flowMax;
  const yPeak = Math.max(first?.pressure ?? 0, chart.demand?.pressure ?? 0);
  const yTicks = niceTicks(yPeak * 1.15);
  const summary =
    t("chartSummary", { start: first ? fmtP(first.pressure) : t("chartStatic"), max: fmtQ(chart.flowMax) }) +
    (chart.demand ? ` ${t("chartDemandPoint", { flow: fmtQ(chart.demand.flow), pressure: fmtP(chart.demand.pressure), verdict: verdict ?? "none" })}` : "") +
    (chart.test ? "" : ` ${t("chartTestBeyond")}`);
  return (
    <figure className="min-w-0 rounded border border-line bg-panel p-3" aria-label={t("chartLabel")}>
      <div className="h-72 w-full" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={chart.supply} margin={{ top: 24, right: 24, bottom: 28, left: 16 }} accessibilityLayer={false} tabIndex={-1}>
            <CartesianGrid stroke={LINE} strokeDasharray="3 3" />
            <XAxis
              dataKey="flow"
              type="number"
              domain={[0, xMax]}
              ticks={xTicks}
              tickFormatter={(v: number) => String(v)}
              label={{ value: `Flow (${chart.flowUnit})`, position: "insideBottom", offset: -18, fill: INK }}
              stroke={INK}
            />
            <YAxis
              type="number"
              domain={[0, yTicks[yTicks.length - 1] ?? "auto"]}
              ticks={yTicks}
              tickFormatter={(v: number) => String(v)}
              label={{ value: `Pressure (${chart.pressureUnit})`, angle: -90, position: "insideLeft", offset: 4, fill: INK, dy: 50 }}
              stroke={INK}
            />
            <Tooltip
              formatter={(value) => (typeof value === "number" ? fmtP(value) : String(value))}
              labelFormatter={(label) => (typeof label === "number" ? fmtQ(label) : String(label))}
            />
            <Line dataKey="pressure" name={t("chartSupply")} stroke={WATER} strokeWidth={2} dot={false} isAnimationActive={false} />
            {chart.test ? <ReferenceDot x={chart.test.flow} y={chart.test.pressure} r={4} fill={WATER} stroke={INK} ifOverflow="discard" /> : null}
            {chart.demand ? (
              <ReferenceDot
                x={chart.demand.flow}
                y={chart.demand.pressure}
                r={6}
                fill={COPPER}
                stroke={INK}
                label={{ value: t("chartDemand"), position: "left", offset: 10, fill: INK }}
                ifOverflow="extendDomain"
              />
            ) : null}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-2 text-sm text-muted">{summary}</figcaption>
    </figure>
  );
}
