import Link from "next/link";
import { useTranslations } from "next-intl";
import { buttonLinkClass } from "@/components/ui/button";

const parts = ["lessons", "quizzes", "certificates", "cards", "calculators", "board"] as const;

export default function HomePage() {
  const t = useTranslations("marketing");
  return (
    <div className="flex flex-col gap-10">
      <section className="grid gap-6 md:grid-cols-[3fr_2fr] md:items-center">
        <div>
          <p className="font-mono text-sm uppercase tracking-wide text-copper">{t("kicker")}</p>
          <h1 className="mt-2 text-4xl sm:text-5xl">{t("headline")}</h1>
          <p className="mt-4 max-w-prose text-lg">{t("lead")}</p>
          <div className="mt-6 flex flex-wrap gap-3">
            <Link href="/sign-in" className={buttonLinkClass}>{t("signIn")}</Link>
            <Link href="/sign-up" className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 py-2 font-bold text-ink no-underline">{t("setUp")}</Link>
          </div>
        </div>
        <HeroDiagram />
      </section>
      <section aria-labelledby="what-heading">
        <h2 id="what-heading" className="text-2xl">{t("what")}</h2>
        <ul className="mt-4 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {parts.map((p) => (
            <li key={p} className="rounded border border-line bg-panel p-4">
              <h3 className="text-lg">{t(`parts.${p}.title`)}</h3>
              <p className="mt-2 text-muted">{t(`parts.${p}.text`)}</p>
            </li>
          ))}
        </ul>
      </section>
      <section className="rounded border-l-4 border-caution bg-caution-light p-4" aria-label={t("safetyNote")}>
        <p>{t.rich("safety", { strong: (c) => <strong>{c}</strong> })}</p>
      </section>
    </div>
  );
}

function HeroDiagram() {
  const t = useTranslations("marketing");
  return (
    <svg viewBox="0 0 320 220" role="img" aria-label={t("diagram")} className="w-full max-w-md">
      <rect className="fill-panel" x="0" y="0" width="320" height="220" />
      <path className="stroke-ink" d="M40 90 L160 30 L280 90" fill="none" strokeWidth="4" />
      <rect className="stroke-ink" x="50" y="90" width="220" height="110" fill="none" strokeWidth="4" />
      <line className="stroke-ink" x1="50" y1="150" x2="270" y2="150" strokeWidth="2" />
      <line className="stroke-water" x1="0" y1="212" x2="90" y2="212" strokeWidth="6" />
      <line className="stroke-copper-bright" x1="88" y1="212" x2="88" y2="100" strokeWidth="6" />
      <line className="stroke-copper-bright" x1="88" y1="102" x2="250" y2="102" strokeWidth="4" />
      <line className="stroke-copper-bright" x1="88" y1="158" x2="250" y2="158" strokeWidth="4" />
      {[140, 220].map((x) => (
        <g key={x}>
          <line className="stroke-copper-bright" x1={x} y1="158" x2={x} y2="166" strokeWidth="4" />
          <path className="stroke-ink" d={`M${x - 8} 168 L${x + 8} 168`} strokeWidth="3" />
        </g>
      ))}
      <path className="stroke-water" d="M132 170 Q140 190 120 200 M148 170 Q140 190 160 200 M212 170 Q220 190 200 200 M228 170 Q220 190 240 200" fill="none" strokeWidth="2" strokeDasharray="4 3" />
      <circle className="stroke-ink" cx="100" cy="190" r="6" fill="none" strokeWidth="2" />
      <text className="fill-ink" x="8" y="206" fontSize="11">{t("waterService")}</text>
      <text className="fill-ink" x="96" y="125" fontSize="11">{t("riser")}</text>
    </svg>
  );
}
