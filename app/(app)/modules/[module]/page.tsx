import type { Metadata } from "next";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { notFound } from "next/navigation";
import { KeepModule } from "@/components/offline/keep-module";
import { buttonLinkClass } from "@/components/ui/button";
import { requireViewer } from "@/lib/access";
import { localizedCatalog, localizedModule } from "@/lib/content";
import { progressByModule } from "@/lib/progress";
import { missingForCompletion, moduleStatus } from "@/lib/completion";
import { moduleActions } from "@/lib/learner-actions";
import { listAttempts } from "@/lib/quiz";

type Params = { params: Promise<{ module: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  return { title: localizedModule((await params).module, localeOf(await getLocale()))?.meta.title ?? (await getTranslations("modules"))("module") };
}

export default async function ModulePage({ params }: Params) {
  const { module: slug } = await params;
  const viewer = await requireViewer("signed-in", `/modules/${slug}`);
  const locale = localeOf(await getLocale());
  const mod = localizedModule(slug, locale);
  if (!mod) notFound();
  const [t, format] = await Promise.all([getTranslations("modules"), getFormatter()]);
  const done = new Set((await progressByModule(viewer.id)).get(slug)?.completed ?? []);
  const [status, attempts, missing] = await Promise.all([moduleStatus(viewer.id, slug), listAttempts(viewer, viewer.id, slug), missingForCompletion(viewer.id, slug, locale)]);
  const paths = localizedCatalog(locale).paths.filter((p) => p.modules.includes(slug));
  const actions = moduleActions({
    slug,
    lessons: mod.lessons.map((l) => ({ slug: l.slug, title: l.meta.title })),
    done,
    openAttempt: attempts.some((a) => a.status === "open"),
    passed: status.lastPassed === true,
    completed: status.completedAt !== null && missing.length === 0,
    hasSkills: mod.skills.length > 0,
    missing,
  }, (key, values) => t(`actions.${key}`, values));

  return (
    <div className="flex flex-col gap-6">
      <nav aria-label={t("breadcrumb")} className="text-sm"><Link href="/modules">{t("metaTitle")}</Link></nav>
      <header>
        <p className="font-mono text-sm text-muted">{t("moduleMeta", { order: mod.meta.order, hours: Number(mod.meta.ceHours) })}</p>
        <h1 className="mt-1 text-3xl sm:text-4xl">{mod.meta.title}</h1>
        <p className="mt-2 max-w-prose text-lg text-muted">{mod.meta.summary}</p>
        <p className="mt-2 text-sm">{t("partOf", { paths: format.list(paths.map((p) => p.title), { type: "unit" }) })}</p>
      </header>
      {status.completedAt ? (
        <p role="status" className="rounded border border-pass bg-pass-light p-3 font-bold text-pass" data-testid="module-complete">
          {t("completeOn", { date: status.completedAt })}
        </p>
      ) : null}
      <section aria-labelledby="lessons-h">
        <h2 id="lessons-h" className="text-2xl">{t("lessons")}</h2>
        <p className="mt-1 text-sm text-muted" data-testid="module-lesson-count">{t("doneCount", { done: done.size, total: mod.lessons.length })}</p>
        <ol className="mt-3 flex flex-col gap-2">
          {mod.lessons.map((l, i) => (
            <li key={l.slug} className="flex flex-wrap items-baseline gap-3 rounded border border-line bg-panel p-3">
              <span className="font-mono text-sm text-muted">{i + 1}.</span>
              <div className="flex-1">
                <Link href={`/modules/${slug}/${l.slug}`} className="font-bold">{l.meta.title}</Link>
                <p className="text-sm text-muted">{l.meta.summary}</p>
              </div>
              <span className="whitespace-nowrap text-sm">{t("minutes", { minutes: l.meta.minutes })}</span>
              <span className={`whitespace-nowrap text-sm font-bold ${done.has(l.slug) ? "text-pass" : "text-muted"}`}>{done.has(l.slug) ? t("lessonDone") : t("lessonToDo")}</span>
            </li>
          ))}
        </ol>
      </section>
      <KeepModule module={slug} />
      <section aria-labelledby="complete-h" className="max-w-prose rounded border border-line bg-panel p-4">
        <h2 id="complete-h" className="text-xl">{t("whatCompletes")}</h2>
        <ul className="mt-2 list-disc pl-6">
          <li>{t("allLessons", { total: mod.lessons.length, done: done.size })}</li>
          <li>
            {t("quizRule", { passMark: mod.meta.passMark, questions: mod.meta.quiz.questionsPerAttempt })}
            {mod.meta.quiz.timeLimitMinutes ? t("quizRuleTime", { minutes: mod.meta.quiz.timeLimitMinutes }) : ""}
            {t("quizRuleAttempts", { attempts: mod.meta.quiz.attemptsPerPeriod, hours: mod.meta.quiz.periodHours })}
            {status.bestScore !== null ? ` ${t("bestScore", { score: status.bestScore })}` : ""}
          </li>
          {mod.meta.requiredSkills.length ? <li>{t("requiredSignOffs", { skills: mod.skills.filter((s) => mod.meta.requiredSkills.includes(s.id)).map((s) => s.title).join("; ") })}</li> : null}
          <li>{t("earns", { hours: Number(mod.meta.ceHours), months: mod.meta.validityMonths })}</li>
        </ul>
        <div className="mt-4 flex flex-wrap gap-3">
          <Link href={actions.main.href} className={buttonLinkClass} data-testid="module-main-action">{actions.main.label}</Link>
          {actions.others.map((a) => (
            <Link key={a.href + a.label} href={a.href} className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 py-2 font-bold text-ink no-underline">{a.label}</Link>
          ))}
        </div>
      </section>
    </div>
  );
}
