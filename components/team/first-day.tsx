import Link from "next/link";
import { useTranslations } from "next-intl";
import type { Step } from "@/lib/team/browser";

/** A new manager's checklist: four steps, each with its page and whether it is done. */
export function FirstDayChecklist({ steps }: { steps: Step[] }) {
  const t = useTranslations("team");
  const next = steps.find((s) => !s.done);
  return (
    <section aria-labelledby="first-day" className="mb-8 rounded border border-copper/50 bg-copper-light p-4" data-testid="first-day">
      <h2 id="first-day" className="text-2xl">{t("firstDay.heading")}</h2>
      <p className="mt-1 text-sm">{t("firstDay.lead")}</p>
      <ol className="mt-3 flex flex-col gap-3">
        {steps.map((s, i) => (
          <li key={s.key} className="flex flex-wrap items-start gap-3 rounded border border-line bg-panel p-3" data-done={s.done}>
            <span aria-hidden="true" className={`inline-flex h-7 w-7 shrink-0 items-center justify-center rounded-full border-2 font-bold ${s.done ? "border-pass bg-pass text-white" : "border-ink/40"}`}>
              {s.done ? "✓" : i + 1}
            </span>
            <div className="min-w-0 flex-1">
              <p className="font-bold">
                {t(`firstDay.${s.key}.title`)}
                {s.done ? <span className="sr-only">{t("firstDay.done")}</span> : null}
              </p>
              <p className="text-sm text-muted">{t(`firstDay.${s.key}.text`)}</p>
            </div>
            <Link
              href={s.href}
              className={`inline-flex min-h-11 items-center rounded px-4 font-bold no-underline ${s === next ? "border border-copper bg-copper text-white" : "border border-ink/40 bg-panel text-ink"}`}
            >
              {t(`firstDay.${s.key}.action`)}
            </Link>
          </li>
        ))}
      </ol>
    </section>
  );
}
