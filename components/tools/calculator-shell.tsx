"use client";

import { useLocale, useTimeZone, useTranslations } from "next-intl";
import { memo, useCallback, useEffect, useMemo, useState, type ReactNode } from "react";
import { useForm, useWatch, type DefaultValues, type FieldErrors, type FieldValues, type Resolver, type UseFormReturn } from "react-hook-form";
import { convertInputUnits, type CalculatorId, type CalculatorReport, type Units } from "@/lib/hydraulics/browser";
import { loadEngine, type LoadedEngine } from "./engine-loader";
import { FormPartsProvider, UnitSwitch } from "./fields";
import { PdfButton as PlainPdfButton } from "./pdf-button";
import { ReportView as PlainReportView } from "./report-view";
import { SupplyChart as PlainSupplyChart } from "./supply-chart";
import type { CalculatorWords, InitialCalculator } from "./types";

export interface CalculatorState<TValues extends FieldValues> {
  form: UseFormReturn<TValues>;
  report: CalculatorReport | null;
  input: unknown;
  /** the inputs changed and the engine that works them out is still loading (first edit only) */
  pending: boolean;
  /** starts loading the engine (on focus or touch in the form, ahead of the first edit) */
  warmUp: () => void;
  /** the few catalog words the form shows before the engine has loaded (from the server) */
  words: CalculatorWords;
}

/**
 * One calculator's form: react-hook-form whose resolver is built from the calculator's input schema
 * (lib/hydraulics/schemas.ts, the same one the report and the PDF parse with). Every change
 * re-validates the whole form (so an error between two fields shows on the right one) and
 * recomputes the report when the inputs are valid.
 *
 * The first values and their report come from the server (./initial-state.ts), worked out the same
 * way, so the page shows its result without running the schemas or the calculation in the
 * browser. Those (./engine.ts) load once the calculator is focused or touched, ahead of the first
 * edit; until they have loaded, changed inputs show "loading", never the report of other values.
 * The report's and the error sentences' words (the calcReports catalog, in the reader's language)
 * load with them.
 */
export function useCalculator<TValues extends FieldValues>(id: CalculatorId, initial: InitialCalculator): CalculatorState<TValues> {
  // the engine comes with the report's and the error sentences' words in the reader's language;
  // numbers come from lib/hydraulics either way
  const tag = useLocale();
  const timeZone = useTimeZone();
  const [loaded, setLoaded] = useState<LoadedEngine | null>(null);
  // one made for another language (the reader switched) is not used
  const engine = loaded?.tag === tag ? loaded : null;
  const resolver = useMemo<Resolver<TValues>>(
    () => async (values, context, options) => {
      // not loaded (offline and not yet cached): no field errors, and no result either, as it stays "loading"
      const e = await loadEngine(tag, timeZone).catch(() => null);
      return (e ? e.engine.formResolver(id, e.tr)(values, context, options as never) : { values: {}, errors: {} }) as never;
    },
    [id, tag, timeZone],
  );
  const form = useForm<TValues>({
    resolver,
    defaultValues: initial.values as DefaultValues<TValues>,
    mode: "onChange",
  });
  const values = useWatch({ control: form.control });
  const key = JSON.stringify(values);
  const initialKey = useMemo(() => JSON.stringify(initial.values), [initial.values]);
  const changed = key !== initialKey;
  const { report, input, pending } = useMemo(() => {
    if (!changed) return { report: initial.report, input: initial.input, pending: false };
    if (!engine) return { report: null, input: null, pending: true };
    return { ...engine.engine.formReport(id, key, engine.tr), pending: false };
  }, [changed, engine, id, key, initial]);
  const warmUp = useCallback(() => {
    if (!engine) void loadEngine(tag, timeZone).then(setLoaded, () => undefined); // offline: tried again at the next edit
  }, [engine, tag, timeZone]);
  useEffect(() => {
    if (changed) warmUp();
  }, [changed, key, warmUp]);
  const { trigger, formState } = form;
  useEffect(() => {
    if (formState.isDirty || formState.submitCount > 0) void trigger();
  }, [key, trigger, formState.isDirty, formState.submitCount]);
  return { form, report, input, pending, warmUp, words: initial.words };
}

// the result's parts re-render only when the result does (not on every change of the form's state)
const ReportView = memo(PlainReportView);
const SupplyChart = memo(PlainSupplyChart);
const PdfButton = memo(PlainPdfButton);

/** every current field error as a list, so none can hide in a collapsed section */
function ErrorList({ errors }: { errors: FieldErrors }) {
  const messages: string[] = [];
  const walk = (node: unknown) => {
    if (!node || typeof node !== "object") return;
    const m = (node as { message?: unknown }).message;
    if (typeof m === "string") messages.push(m);
    for (const [k, v] of Object.entries(node)) if (k !== "ref" && k !== "message" && k !== "type") walk(v);
  };
  walk(errors);
  const unique = [...new Set(messages)];
  if (!unique.length) return null;
  return (
    <ul className="mt-1 list-disc pl-5 text-sm">
      {unique.map((m) => (
        <li key={m}>{m}</li>
      ))}
    </ul>
  );
}

/** title, unit switch, the fields, then the worked result, chart and PDF button */
export function CalculatorShell<TValues extends FieldValues>({
  id,
  state,
  children,
  embedded,
}: {
  id: CalculatorId;
  state: CalculatorState<TValues>;
  children: ReactNode;
  embedded?: boolean;
}) {
  const t = useTranslations("tools");
  const { form, report, input, pending, warmUp, words } = state;
  const units = (useWatch({ control: form.control, name: "units" as never }) as unknown as Units | undefined) ?? "us";
  const info = { title: t(`info.${id}.title`), summary: t(`info.${id}.summary`) };

  function switchUnits(next: Units) {
    if (next === units) return;
    form.reset(convertInputUnits(form.getValues(), units, next) as TValues, { keepDefaultValues: true });
    form.setValue("units" as never, next as never, { shouldDirty: true });
  }

  return (
    <>
      <section
        className={`my-6 rounded border border-line bg-paper p-4 text-ink ${embedded ? "" : "sm:p-6"}`}
        data-calculator={id}
        onFocus={warmUp}
        onPointerDown={warmUp}
      >
        {embedded ? (
          <>
            <h3 className="text-xl font-bold">{info.title}</h3>
            <p className="text-muted">{info.summary}</p>
          </>
        ) : null}
        <div className={`${embedded ? "mt-4 " : ""}grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]`}>
          <form
            noValidate
            className="flex flex-col gap-4"
            aria-label={t("inputsLabel", { title: info.title })}
            onSubmit={form.handleSubmit(() => undefined)}
          >
            <UnitSwitch units={units} onSwitch={switchUnits} />
            <FormPartsProvider form={form} words={words}>
              {children}
            </FormPartsProvider>
            <button type="submit" className="sr-only">
              {t("calculate")}
            </button>
          </form>
          <div className="flex min-w-0 flex-col gap-4" id={`${id}-result`}>
            {report ? (
              <>
                {report.chart ? <SupplyChart chart={report.chart} verdict={report.verdict?.result} /> : null}
                <ReportView report={report} />
                <PdfButton id={id} input={input} />
              </>
            ) : pending ? (
              <p role="status" className="rounded border border-line bg-panel px-3 py-2 text-muted">
                {t("loading")}
              </p>
            ) : (
              <>
                <div role="status" className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">
                  <p>{t("fixFields")}</p>
                  <ErrorList errors={form.formState.errors} />
                </div>
                <p className="text-sm text-muted">{t("caution")}</p>
              </>
            )}
          </div>
        </div>
        <SummaryBar id={id} report={report} words={words} />
      </section>
    </>
  );
}

/**
 * At phone width the worked result sits far below the inputs: keep the headline figure (and the
 * pass/short verdict) in view at the bottom of the screen while the inputs are edited.
 */
const SummaryBar = memo(function SummaryBar({ id, report, words }: { id: CalculatorId; report: CalculatorReport | null; words: CalculatorWords }) {
  const t = useTranslations("tools");
  const headline = report?.results[0];
  const margin = report?.results.find((r) => r.label === words.margin || r.label === words.shortfall);
  return (
    <div
      className="sticky bottom-0 z-10 -mx-4 mt-4 flex items-center justify-between gap-3 border-t border-line bg-paper px-4 py-2 lg:hidden"
      data-summary-bar
    >
      {headline ? (
        <p className="min-w-0 text-sm">
          <span className="text-muted">{headline.label}: </span>
          <span className="font-mono font-bold">{headline.text}</span>
          {report?.verdict ? (
            <span className={`ml-2 font-bold ${report.verdict.result === "pass" ? "text-pass" : "text-caution"}`}>
              {report.verdict.result === "pass" ? t("pass") : t("short")}
              {margin ? ` (${margin.label.toLowerCase()} ${margin.text})` : ""}
            </span>
          ) : null}
        </p>
      ) : (
        <p className="text-sm font-bold text-caution">{t("fixFields")}</p>
      )}
      <a href={`#${id}-result`} className="inline-flex min-h-6 shrink-0 items-center text-sm">
        {t("fullResult")}
      </a>
    </div>
  );
});
