"use client";
import { useTranslations } from "next-intl";
import dynamic from "next/dynamic";
import type { CalculatorId } from "@/lib/hydraulics/browser";
import type { InitialCalculator } from "./types";

/**
 * The calculator as embedded in lessons and cards, loaded only on pages that show one: the forms,
 * the hydraulics library and the chart library stay out of every other lesson's first load.
 */
const Lazy = dynamic(() => import("./calculator").then((m) => m.Calculator), {
  ssr: true,
  loading: () => <LoadingCalculator />,
});

function LoadingCalculator() {
  const t = useTranslations("tools");
  return <p className="my-4 rounded border border-line bg-panel p-3 text-muted">{t("loading")}</p>;
}

export function CalculatorEmbedLazy(props: { id: CalculatorId | string; initial?: InitialCalculator; embedded?: boolean }) {
  return (
    <div className="wide not-prose my-6">
      <Lazy {...props} />
    </div>
  );
}
