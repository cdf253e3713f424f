"use client";
import { useTranslations } from "next-intl";
import { CartesianGrid, ComposedChart, Line, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { formatForDisplay, type ReportChart } from "@/lib/hydraulics/browser";

// palette from tailwind.config.ts
const WATER = "#1B617A";
const COPPER = "#9A4F12";
const INK = "#14202B";
const LINE = "#D5CFC3";

/**
 * The drawing inside SupplyChart (./supply-chart.tsx): recharts is large, so this part loads after
 * the page is interactive, into a box of fixed height that the page has already laid out.
 */
export function SupplyPlot({ chart, xMax, xTicks, yTicks }: { chart: ReportChart; xMax: number; xTicks: number[]; yTicks: number[] }) {
  const t = useTranslations("tools");
  const fmtP = (v: number) => formatForDisplay(v, chart.pressureUnit);
  const fmtQ = (v: number) => formatForDisplay(v, chart.flowUnit);
  return (
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
  );
}
