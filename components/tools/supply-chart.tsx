"use client";

import { CartesianGrid, ComposedChart, Line, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { formatForDisplay, type ReportChart } from "@/lib/hydraulics";

// palette from tailwind.config.ts
const WATER = "#1B617A";
const COPPER = "#9A4F12";
const INK = "#14202B";
const LINE = "#D5CFC3";

/** the water supply curve from a flow test, with the system's demand point */
export function SupplyChart({ chart, verdict }: { chart: ReportChart; verdict?: "pass" | "short" }) {
  const fmtP = (v: number) => formatForDisplay(v, chart.pressureUnit);
  const fmtQ = (v: number) => formatForDisplay(v, chart.flowUnit);
  const first = chart.supply[0];
  const summary =
    `Supply curve from ${first ? fmtP(first.pressure) : "the static pressure"} at no flow, falling as flow rises.` +
    (chart.demand ? ` Demand point: ${fmtQ(chart.demand.flow)} at ${fmtP(chart.demand.pressure)}${verdict ? ` (${verdict === "pass" ? "below the curve: the supply is enough" : "above the curve: the supply is short"})` : ""}.` : "");
  return (
    <figure className="rounded border border-line bg-panel p-3" aria-label="Demand versus supply">
      <div className="h-72 w-full" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={chart.supply} margin={{ top: 10, right: 16, bottom: 24, left: 8 }} accessibilityLayer={false} tabIndex={-1}>
            <CartesianGrid stroke={LINE} strokeDasharray="3 3" />
            <XAxis
              dataKey="flow"
              type="number"
              domain={[0, "dataMax"]}
              tickFormatter={(v: number) => String(Math.round(v))}
              label={{ value: `Flow (${chart.flowUnit})`, position: "insideBottom", offset: -14, fill: INK }}
              stroke={INK}
            />
            <YAxis
              type="number"
              domain={[0, "auto"]}
              tickFormatter={(v: number) => String(Math.round(v * 10) / 10)}
              label={{ value: `Pressure (${chart.pressureUnit})`, angle: -90, position: "insideLeft", fill: INK }}
              stroke={INK}
            />
            <Tooltip
              formatter={(value) => (typeof value === "number" ? fmtP(value) : String(value))}
              labelFormatter={(label) => (typeof label === "number" ? fmtQ(label) : String(label))}
            />
            <Line dataKey="pressure" name="Supply (flow test)" stroke={WATER} strokeWidth={2} dot={false} isAnimationActive={false} />
            {chart.demand ? (
              <ReferenceDot
                x={chart.demand.flow}
                y={chart.demand.pressure}
                r={6}
                fill={COPPER}
                stroke={INK}
                label={{ value: "Demand", position: "top", fill: INK }}
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
