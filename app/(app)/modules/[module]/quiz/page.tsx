import type { Metadata } from "next";
import { getLocale } from "next-intl/server";
import { localeOf } from "@/lib/i18n/config";
import Link from "next/link";
import { notFound } from "next/navigation";
import { QuizRunner } from "@/components/quiz/quiz-runner";
import { requireViewer } from "@/lib/access";
import { missingForCompletion, moduleStatus } from "@/lib/completion";
import { localizedModule } from "@/lib/content";
import { missingLinks, quizStartLabel } from "@/lib/learner-actions";
import { listAttempts } from "@/lib/quiz";
import { isoDay, isoMinute } from "@/lib/dates";
import { Table } from "@/components/ui/table";

type Params = { params: Promise<{ module: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  return { title: `Quiz: ${localizedModule((await params).module, localeOf(await getLocale()))?.meta.title ?? "module"}` };
}

export default async function QuizPage({ params }: Params) {
  const { module: slug } = await params;
  const viewer = await requireViewer("signed-in", `/modules/${slug}/quiz`);
  const locale = localeOf(await getLocale());
  const mod = localizedModule(slug, locale);
  if (!mod) notFound();
  const [attempts, status, missing] = await Promise.all([listAttempts(viewer, viewer.id, slug), moduleStatus(viewer.id, slug), missingForCompletion(viewer.id, slug, locale)]);
  const r = mod.meta.quiz;
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-sm"><Link href="/modules">Modules</Link> / <Link href={`/modules/${slug}`}>{mod.meta.title}</Link></nav>
      <header>
        <h1 className="text-3xl">Quiz: {mod.meta.title}</h1>
        <p className="mt-2 max-w-prose text-muted">
          {r.questionsPerAttempt} questions drawn for you, pass mark {mod.meta.passMark}%{r.timeLimitMinutes ? `, ${r.timeLimitMinutes} minutes` : ", no time limit"}. Up to {r.attemptsPerPeriod} attempts in {r.periodHours} hours{r.waitMinutes ? `, ${r.waitMinutes} minutes apart` : ""}. Numeric answers state their unit and the tolerance accepted.
        </p>
      </header>
      {status.completedAt ? <p role="status" className="rounded border border-pass bg-pass-light p-3 font-bold text-pass" data-testid="module-complete">✓ Module complete on {isoDay(status.completedAt)}</p> : null}
      {!status.completedAt && status.lastPassed && missing.length ? (
        <div className="rounded border border-line bg-panel p-3" data-testid="still-to-do">
          <p>You passed the quiz. To complete the module, finish:</p>
          <ul className="mt-1 list-disc pl-6">
            {missingLinks(slug, mod.lessons.map((l) => ({ slug: l.slug, title: l.meta.title })), missing).map((m) => (
              <li key={m.text}>{m.href ? <Link href={m.href}>{m.text}</Link> : m.text}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <QuizRunner
        module={slug}
        canStart
        blockedReason={null}
        startLabel={quizStartLabel({ openAttempt: attempts.some((a) => a.status === "open"), passed: status.lastPassed === true, completed: status.completedAt !== null })}
      />
      {attempts.length ? (
        <section aria-labelledby="past-h">
          <h2 id="past-h" className="text-xl">Your attempts</h2>
          <Table
            label="Your attempts"
            className="mt-2 max-w-xl"
            rows={attempts}
            rowKey={(a) => a.id}
            columns={[
              { key: "started", header: "Started", className: "font-mono", cell: (a) => isoMinute(a.startedAt) },
              { key: "score", header: "Score", className: "font-mono", cell: (a) => (a.score !== null ? `${a.score}%` : "—") },
              { key: "result", header: "Result", cell: (a) => (a.status === "open" ? "in progress" : a.passed ? "passed" : "not passed") },
            ]}
          />
        </section>
      ) : null}
    </div>
  );
}
