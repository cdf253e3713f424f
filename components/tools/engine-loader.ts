/**
 * Loads ./engine.ts once, with the calculator reports' words (the calcReports catalog) in the
 * reader's language, which travel with that code rather than with every page that shows a
 * calculator. Tried again after a failed load (e.g. a dropped connection).
 */
import { localeOf, type Locale } from "@/lib/i18n/browser";
import type { ReportT } from "@/lib/hydraulics/browser";

export type CalculatorEngine = typeof import("./engine");

/** the engine and a calcReports translator for one language */
export interface LoadedEngine {
  engine: CalculatorEngine;
  tr: ReportT;
  /** the formatting tag it was made for (next-intl's useLocale(), e.g. "es-US") */
  tag: string;
}

// one import per language, each its own chunk (the service worker precaches every script chunk)
const CATALOGS: Record<Locale, () => Promise<{ default: Record<string, unknown> }>> = {
  en: () => import("@/messages/en/calcReports.json"),
  es: () => import("@/messages/es/calcReports.json"),
};

const loading = new Map<string, Promise<LoadedEngine>>();

/** `tag` and `timeZone`: next-intl's useLocale() and useTimeZone(), as the page's own translators use */
export function loadEngine(tag: string, timeZone: string | undefined): Promise<LoadedEngine> {
  let p = loading.get(tag);
  if (!p) {
    p = Promise.all([import("./engine"), CATALOGS[localeOf(tag)]()])
      .then(([engine, catalog]) => ({ engine, tr: engine.reportTranslator(tag, timeZone, catalog.default), tag }))
      .catch((e: unknown) => {
        loading.delete(tag);
        throw e;
      });
    loading.set(tag, p);
  }
  return p;
}
