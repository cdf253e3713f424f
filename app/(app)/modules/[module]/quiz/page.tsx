import type { Metadata } from "next";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { notFound } from "next/navigation";
import { QuizRunner } from "@/components/quiz/quiz-runner";
import { requireViewer } from "@/lib/access";
import { missingForCompletion, moduleStatus } from "@/lib/completion";
import { localizedModule } from "@/lib/content";
import { missingLinks, quizStartLabel, type ActionLabel } from "@/lib/learner-actions";
import { listAttempts } from "@/lib/quiz";
import { Table } from "@/components/ui/table";

type Params = { params: Promise<{ module: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const t = await getTranslations("modules");
  return { title: t("quizTitle", { module: localizedModule((await params).module, localeOf(await getLocale()))?.meta.title ?? t("moduleLower") }) };
}

export default async function QuizPage({ params }: Params) {
  const { module: slug } = await params;
  const viewer = await requireViewer("signed-in", `/modules/${slug}/quiz`);
  const locale = localeOf(await getLocale());
  const mod = localizedModule(slug, locale);
  if (!mod) notFound();
  const [attempts, status, missing] = await Promise.all([listAttempts(viewer, viewer.id, slug), moduleStatus(viewer.id, slug), missingForCompletion(viewer.id, slug, locale)]);
  const r = mod.meta.quiz;
  const [t, format] = await Promise.all([getTranslations("modules"), getFormatter()]);
  const label: ActionLabel = (key, values) => t(`actions.${key}`, values);
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label={t("breadcrumb")} className="text-sm"><Link href="/modules">{t("metaTitle")}</Link> / <Link href={`/modules/${slug}`}>{mod.meta.title}</Link></nav>
      <header>
        <h1 className="text-3xl">{t("quizTitle", { module: mod.meta.title })}</h1>
        <p className="mt-2 max-w-prose text-muted">
          {t("quizRules", { questions: r.questionsPerAttempt, passMark: mod.meta.passMark, limit: r.timeLimitMinutes ?? 0 })}{" "}
          {t("quizAttempts", { attempts: r.attemptsPerPeriod, hours: r.periodHours, wait: r.waitMinutes ?? 0 })}{" "}
          {t("quizNumeric")}
        </p>
      </header>
      {status.completedAt ? <p role="status" className="rounded border border-pass bg-pass-light p-3 font-bold text-pass" data-testid="module-complete">{t("completeOn", { date: status.completedAt })}</p> : null}
      {!status.completedAt && status.lastPassed && missing.length ? (
        <div className="rounded border border-line bg-panel p-3" data-testid="still-to-do">
          <p>{t("passedFinish")}</p>
          <ul className="mt-1 list-disc pl-6">
            {missingLinks(slug, mod.lessons.map((l) => ({ slug: l.slug, title: l.meta.title })), missing, label).map((m) => (
              <li key={m.text}>{m.href ? <Link href={m.href}>{m.text}</Link> : m.text}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <QuizRunner
        module={slug}
        canStart
        blockedReason={null}
        startLabel={quizStartLabel({ openAttempt: attempts.some((a) => a.status === "open"), passed: status.lastPassed === true, completed: status.completedAt !== null }, label)}
      />
      {attempts.length ? (
        <section aria-labelledby="past-h">
          <h2 id="past-h" className="text-xl">{t("yourAttempts")}</h2>
          <Table
            label={t("yourAttempts")}
            className="mt-2 max-w-xl"
            rows={attempts}
            rowKey={(a) => a.id}
            columns={[
              { key: "started", header: t("started"), className: "font-mono", cell: (a) => format.dateTime(new Date(a.startedAt), { dateStyle: "medium", timeStyle: "short" }) },
              { key: "score", header: t("score"), className: "font-mono", cell: (a) => (a.score !== null ? t("percent", { score: a.score }) : "—") },
              { key: "result", header: t("result"), cell: (a) => (a.status === "open" ? t("inProgress") : a.passed ? t("passed") : t("notPassed")) },
            ]}
          />
        </section>
      ) : null}
    </div>
  );
}
