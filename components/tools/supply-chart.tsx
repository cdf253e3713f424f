"use client";
import { useTranslations } from "next-intl";
import dynamic from "next/dynamic";
import { useEffect, useRef, useState } from "react";
import { formatForDisplay, type ReportChart } from "@/lib/hydraulics/browser";

// recharts (the drawing) is the largest script on a calculator page. It loads only once the chart's
// box comes near the screen (on a phone the chart sits below the inputs), after the page is
// interactive, so it never blocks the first input. The box is laid out from the start (no layout
// shift) and the figure's caption, which says what the drawing shows, is in the page's HTML.
const SupplyPlot = dynamic(() => import("./supply-plot").then((m) => m.SupplyPlot), { ssr: false });

/** True once the element has come within `margin` of the viewport (true at once without IntersectionObserver). */
function useNearScreen<T extends Element>(margin = "300px"): [React.RefObject<T | null>, boolean] {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (near || !el) return;
    // every browser Riser supports has IntersectionObserver; without it the drawing loads at once
    if (typeof IntersectionObserver === "undefined") {
      const timer = setTimeout(() => setNear(true), 0);
      return () => clearTimeout(timer);
    }
    const io = new IntersectionObserver((entries) => entries.some((e) => e.isIntersecting) && setNear(true), { rootMargin: margin });
    io.observe(el);
    return () => io.disconnect();
  }, [near, margin]);
  return [ref, near];
}

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
  const [box, near] = useNearScreen<HTMLDivElement>();
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
      <div ref={box} className="h-72 w-full" aria-hidden="true">
        {near ? <SupplyPlot chart={chart} xMax={xMax} xTicks={xTicks} yTicks={yTicks} /> : null}
      </div>
      <figcaption className="mt-2 text-sm text-muted">{summary}</figcaption>
    </figure>
  );
}
