import type { Metadata } from "next";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { useFormatter, useTranslations } from "next-intl";
import { getLocale, getTranslations } from "next-intl/server";
import { notFound } from "next/navigation";
import { EvidenceThumbs } from "@/components/signoffs/evidence-thumbs";
import { SignOffBadge } from "@/components/signoffs/status-badge";
import { UploadForm } from "@/components/signoffs/upload-form";
import { requireViewer } from "@/lib/access";
import { localizedModule } from "@/lib/content";
import { signOffsOf, type SignOffItem } from "@/lib/signoffs";

type Params = { params: Promise<{ module: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const t = await getTranslations("modules");
  return { title: t("signOffsTitle", { module: localizedModule((await params).module, localeOf(await getLocale()))?.meta.title ?? t("moduleLower") }) };
}

function Decision({ s }: { s: SignOffItem }) {
  const t = useTranslations("modules");
  const format = useFormatter();
  const day = (d: Date) => format.dateTime(d, "short");
  if (s.status === "submitted") return <p>{t("sentOn", { date: day(s.submittedAt) })}</p>;
  return (
    <div className={`rounded border p-3 ${s.status === "approved" ? "border-pass bg-pass-light" : "border-caution bg-caution-light"}`}>
      <p className="font-bold">
        {t(s.status === "approved" ? "signedOffBy" : "returnedBy", { name: s.reviewerName ?? t("aReviewer"), date: s.reviewedAt ? day(s.reviewedAt) : "—" })}
      </p>
      {s.reviewComment ? <p className="mt-1 whitespace-pre-line">“{s.reviewComment}”</p> : null}
    </div>
  );
}

export default async function ModuleSignOffsPage({ params }: Params) {
  const { module: slug } = await params;
  const viewer = await requireViewer("signed-in", `/modules/${slug}/sign-offs`);
  const mod = localizedModule(slug, localeOf(await getLocale()));
  if (!mod) notFound();
  const mine = await signOffsOf(viewer.id, slug);
  const required = new Set(mod.meta.requiredSkills);
  const t = await getTranslations("modules");

  return (
    <div className="flex flex-col gap-6">
      <nav aria-label={t("breadcrumb")} className="text-sm">
        <Link href="/modules">{t("metaTitle")}</Link> / <Link href={`/modules/${slug}`}>{mod.meta.title}</Link>
      </nav>
      <header>
        <h1 className="text-3xl">{t("actions.signOffs")}</h1>
        <p className="mt-2 max-w-prose text-muted">
          {t("signOffsLead", { module: mod.meta.title })}
          {` ${required.size ? t("signOffsRequired") : t("signOffsOptional")}`}
        </p>
      </header>
      <aside aria-label={t("safety")} className="max-w-prose rounded border-l-4 border-caution bg-caution-light p-3">
        <p className="font-bold text-caution">{t("photoCaution")}</p>
        <p className="mt-1">{t("photoCautionBody")}</p>
      </aside>
      {mod.skills.map((skill) => {
        const history = mine.filter((s) => s.skillId === skill.id);
        const latest = history[0];
        const canSend = !latest || latest.status === "returned";
        return (
          <section key={skill.id} aria-labelledby={`skill-${skill.id}`} className="rounded border border-line bg-panel p-4" data-testid={`skill-${skill.id}`}>
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h2 id={`skill-${skill.id}`} className="max-w-prose text-xl">
                {skill.title}
              </h2>
              <div className="flex flex-wrap gap-2">
                {required.has(skill.id) ? <span className="rounded border border-copper bg-copper-light px-2 py-0.5 text-sm font-bold text-copper">{t("required")}</span> : null}
                <SignOffBadge status={latest?.status ?? "none"} />
              </div>
            </div>
            <div className="mt-3 grid gap-4 md:grid-cols-2">
              <div>
                <h3 className="font-bold">{t("observe")}</h3>
                <ul className="mt-1 list-disc pl-6">
                  {skill.observe.map((o) => (
                    <li key={o}>{o}</li>
                  ))}
                </ul>
              </div>
              <div>
                <h3 className="font-bold">{t("evidence")}</h3>
                <p className="mt-1">{skill.evidence}</p>
              </div>
            </div>
            {latest ? (
              <div className="mt-4 flex flex-col gap-2" data-testid="latest-sign-off">
                <Decision s={latest} />
                {latest.note ? <p className="text-sm"><span className="font-bold">{t("yourNote")}</span> {latest.note}</p> : null}
                <EvidenceThumbs signOffId={latest.id} items={latest.evidence} />
              </div>
            ) : null}
            {canSend ? (
              <div className="mt-4 border-t border-line pt-4">
                <h3 className="mb-2 font-bold">{latest ? t("sendNewEvidence") : t("sendEvidence")}</h3>
                <UploadForm module={slug} skill={skill.id} skillTitle={skill.title} />
              </div>
            ) : null}
            {history.length > 1 ? (
              <details className="mt-4">
                <summary className="cursor-pointer font-bold">{t("earlier", { count: history.length - 1 })}</summary>
                <ol className="mt-2 flex flex-col gap-3">
                  {history.slice(1).map((s) => (
                    <li key={s.id} className="flex flex-col gap-2 border-t border-line pt-2">
                      <Decision s={s} />
                      <EvidenceThumbs signOffId={s.id} items={s.evidence} />
                    </li>
                  ))}
                </ol>
              </details>
            ) : null}
          </section>
        );
      })}
    </div>
  );
}
