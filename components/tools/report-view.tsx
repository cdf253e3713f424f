import { useTranslations } from "next-intl";
import type { CalculatorReport } from "@/lib/hydraulics";

const statusStyle = {
  ok: "border-pass bg-pass-light text-pass",
  check: "border-line bg-panel text-ink",
  fails: "border-caution bg-caution-light text-caution",
} as const;

/** formula, steps, results, checks, sources and the caution for one calculation */
export function ReportView({ report }: { report: CalculatorReport }) {
  const t = useTranslations("tools");
  const statusLabel = { ok: t("statusOk"), check: "", fails: t("statusFails") };
  const [headline, ...more] = report.results;
  return (
    <section aria-label={t("result")} className="flex min-w-0 flex-col gap-4 break-words" data-report={report.id}>
      {headline ? (
        <div className="rounded border border-line bg-panel p-4" aria-live="polite">
          <p className="text-sm text-muted">{headline.label}</p>
          <p className="font-mono text-3xl font-bold text-ink" data-result="headline">
            {headline.text}
          </p>
          {more.length ? (
            <dl className="mt-3 grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr]">
              {more.map((r) => (
                <div key={r.label} className="contents">
                  <dt className="text-muted">{r.label}</dt>
                  <dd className="font-mono">{r.text}</dd>
                </div>
              ))}
            </dl>
          ) : null}
        </div>
      ) : null}

      {report.verdict ? (
        <p
          role="status"
          data-verdict={report.verdict.result}
          className={`rounded border px-3 py-2 font-bold ${report.verdict.result === "pass" ? "border-pass bg-pass-light text-pass" : "border-caution bg-caution-light text-caution"}`}
        >
          {report.verdict.result === "pass" ? t("passPrefix") : t("shortPrefix")}
          {report.verdict.text}
        </p>
      ) : null}

      <div>
        <h3 className="font-bold">{t("formula")}</h3>
        <ul className="mt-1 flex flex-col gap-1">
          {report.formula.map((line) => (
            <li key={line} className="rounded bg-paper px-2 py-1 font-mono text-sm text-ink">
              {line}
            </li>
          ))}
        </ul>
      </div>

      <div>
        <h3 className="font-bold">{t("steps")}</h3>
        <ol className="mt-1 flex flex-col divide-y divide-line rounded border border-line bg-panel">
          {report.steps.map((s, i) => (
            <li key={`${i}-${s.label}`} className="grid gap-1 px-3 py-2 sm:grid-cols-[1fr_auto] sm:items-baseline">
              <div>
                <p>{s.label}</p>
                <p className="font-mono text-sm text-muted">{s.work}</p>
              </div>
              <p className="font-mono font-bold sm:text-right">{s.text}</p>
            </li>
          ))}
        </ol>
      </div>

      {report.checks.length ? (
        <div>
          <h3 className="font-bold">{t("checks")}</h3>
          <ul className="mt-1 flex flex-col gap-1">
            {report.checks.map((c) => (
              <li key={c.text} className={`rounded border px-3 py-2 text-sm ${statusStyle[c.status]}`}>
                {statusLabel[c.status] ? <span className="font-bold">{statusLabel[c.status]}</span> : null}
                {c.text}
              </li>
            ))}
          </ul>
        </div>
      ) : null}

      <div>
        <h3 className="font-bold">{t("sources")}</h3>
        <ul className="mt-1 list-disc pl-5 text-sm text-muted">
          {report.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      </div>

      <aside className="rounded border-l-4 border-caution bg-caution-light p-3 text-ink" aria-label={t("cautionHeading")}>
        <p className="font-bold text-caution">{t("cautionHeading")}</p>
        <p>{report.caution}</p>
      </aside>
    </section>
  );
}
