import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getLocale, getTranslations } from "next-intl/server";
import { esLessons, lessons as enLessons } from "@/content/.generated/registry";
import { MarkComplete } from "@/components/lesson/mark-complete";
import { lessonComponents } from "@/components/lesson/mdx";
import { termFor } from "@/components/lesson/term";
import { LocalRules, editionComponents } from "@/components/lesson/edition";
import { editionText } from "@/components/lesson/lesson-text";
import { adoptedCode, localRulesFor } from "@/lib/editions";
import { lessonChangesDue } from "@/lib/refreshers";
import { requireViewer } from "@/lib/access";
import { lessonTopics, localizedModule } from "@/lib/content";
import { localeOf } from "@/lib/i18n/browser";
import { recordLessonOpen } from "@/lib/progress";

// Rendered per request (never a shared-cache copy): the session is checked here (proxy.ts checks it
// too) and the server stamps the person's first open, from which the seat-time rule counts.
export const dynamic = "force-dynamic";

type Params = { params: Promise<{ module: string; lesson: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const { module, lesson } = await params;
  const l = localizedModule(module, localeOf(await getLocale()))?.lessons.find((x) => x.slug === lesson);
  return { title: l?.meta.title ?? (await getTranslations("modules"))("lesson") };
}

export default async function LessonPage({ params }: Params) {
  const { module: moduleSlug, lesson: lessonSlug } = await params;
  const viewer = await requireViewer("signed-in", `/modules/${moduleSlug}/${lessonSlug}`);
  const locale = localeOf(await getLocale());
  const tc = await getTranslations("content");
  const mod = localizedModule(moduleSlug, locale);
  const index = mod?.lessons.findIndex((l) => l.slug === lessonSlug) ?? -1;
  const load = (locale === "es" ? esLessons : enLessons)[`${moduleSlug}/${lessonSlug}`];
  if (!mod || index < 0 || !load) notFound();
  await recordLessonOpen(viewer.id, mod.slug, lessonSlug);
  const lesson = mod.lessons[index]!;
  const prev = mod.lessons[index - 1];
  const next = mod.lessons[index + 1];
  const { default: Body } = await load();
  const [code, rules, changes] = await Promise.all([
    adoptedCode(viewer.organizationId),
    localRulesFor(viewer.organizationId, lessonTopics(mod.slug, lesson.slug)),
    lessonChangesDue(viewer, mod.slug, lesson.slug),
  ]);
  const [t, tl, editions] = await Promise.all([getTranslations("modules"), getTranslations("lesson"), editionText()]);
  // the progress line for 0…all lessons done, worded here (components/lesson/mark-complete.tsx)
  const total = mod.lessons.length;
  const progressLines = Array.from({ length: total + 1 }, (_, count) => tl("moduleProgress", { count, total, minutes: Math.ceil(lesson.meta.minutes / 2) }));

  return (
    <article className="flex flex-col gap-6">
      <nav aria-label={t("breadcrumb")} className="text-sm">
        <Link href="/modules">{t("metaTitle")}</Link> / <Link href={`/modules/${mod.slug}`}>{mod.meta.title}</Link>
      </nav>
      <header>
        <p className="font-mono text-sm text-muted">
          {t("lessonOf", { n: index + 1, total: mod.lessons.length, minutes: lesson.meta.minutes })}
        </p>
        <h1 className="mt-1 text-3xl sm:text-4xl">{lesson.meta.title}</h1>
        <p className="mt-2 max-w-prose text-lg text-muted">{lesson.meta.summary}</p>
      </header>
      <section aria-labelledby="objectives" className="max-w-prose rounded border border-line bg-panel p-4">
        <h2 id="objectives" className="text-lg">{t("objectives")}</h2>
        <ul className="mt-2 list-disc pl-6">
          {lesson.meta.objectives.map((o) => (
            <li key={o}>{o}</li>
          ))}
        </ul>
      </section>
      <p className="max-w-prose border-l-4 border-copper pl-3 text-sm" data-testid="edition-note">
        <strong>{t("editionNote")}</strong> {lesson.meta.edition}
        {code ? ` ${t(code.ircP2904 ? "orgEditionIrc" : "orgEdition", { edition: code.edition, name: code.name, state: code.state })}` : null}
      </p>
      {changes.map((c) => (
        <p key={c.id} className="max-w-prose rounded border-l-4 border-copper bg-copper-light p-3" data-testid="lesson-change">
          <strong>{t("changedSince")}</strong> <mark className="bg-transparent font-bold">{c.whatChanged}</mark>
        </p>
      ))}
      <LocalRules rules={rules} />
      <div className="prose-riser">
        <Body components={{ ...lessonComponents, Term: termFor(locale, (term) => tc("englishTerm", { term })), ...editionComponents(code?.edition ?? null, editions) }} />
      </div>
      <section aria-labelledby="sources" className="max-w-prose text-sm">
        <h2 id="sources" className="text-lg">{t("lessonSources")}</h2>
        <ul className="mt-2 list-disc pl-6">
          {lesson.meta.sources.map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
        <p className="mt-2 text-muted">{t("updated", { date: lesson.meta.updated })}</p>
      </section>
      <MarkComplete module={mod.slug} lesson={lesson.slug} title={`${mod.meta.title} — ${lesson.meta.title}`} total={total} minutes={lesson.meta.minutes} progressLines={progressLines} />
      <nav aria-label={t("lessons")} className="flex flex-wrap justify-between gap-4">
        {prev ? <Link href={`/modules/${mod.slug}/${prev.slug}`}>← {prev.meta.title}</Link> : <span />}
        {next ? (
          <Link href={`/modules/${mod.slug}/${next.slug}`}>{next.meta.title} →</Link>
        ) : (
          <Link href={`/modules/${mod.slug}/quiz`}>{t("takeQuiz")}</Link>
        )}
      </nav>
    </article>
  );
}
