import type { Metadata } from "next";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { getLocale, getTranslations } from "next-intl/server";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { completionsOf } from "@/lib/completion";
import { localizedCatalog } from "@/lib/content";
import { progressByModule } from "@/lib/progress";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("modules"))("metaTitle") };
}

const AUDIENCES = ["installer", "designer", "sales", "manager"] as const;

export default async function ModulesPage({ searchParams }: { searchParams: Promise<{ path?: string; audience?: string }> }) {
  const viewer = await requireViewer("signed-in", "/modules");
  const { path, audience } = await searchParams;
  const t = await getTranslations("modules");
  const catalog = localizedCatalog(localeOf(await getLocale()));
  const chosenPath = catalog.paths.find((p) => p.slug === path);
  const modules = catalog.modules.filter(
    (m) => (!chosenPath || chosenPath.modules.includes(m.slug)) && (!audience || (m.meta.audience as string[]).includes(audience)),
  );
  const [progress, completions] = await Promise.all([progressByModule(viewer.id), completionsOf(viewer.id)]);

  return (
    <>
      <PageTitle title={t("metaTitle")} lead={t("listLead")} />
      <form method="get" className="mb-6 flex flex-wrap items-end gap-4 rounded border border-line bg-panel p-3" aria-label={t("filter")}>
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor="path" className="text-sm font-bold">{t("path")}</label>
          <select id="path" name="path" defaultValue={path ?? ""} className="min-h-11 max-w-full rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("allPaths")}</option>
            {catalog.paths.map((p) => (
              <option key={p.slug} value={p.slug}>{p.title}</option>
            ))}
          </select>
        </div>
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor="audience" className="text-sm font-bold">{t("for")}</label>
          <select id="audience" name="audience" defaultValue={audience ?? ""} className="min-h-11 max-w-full rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("everyone")}</option>
            {AUDIENCES.map((k) => (
              <option key={k} value={k}>{t(`audience.${k}`)}</option>
            ))}
          </select>
        </div>
        <button type="submit" className="min-h-11 rounded border border-ink/40 bg-paper px-4 font-bold">{t("apply")}</button>
        {path || audience ? <Link href="/modules" className="self-center">{t("clearFilters")}</Link> : null}
      </form>
      {chosenPath ? <p className="mb-4 max-w-prose">{chosenPath.summary}</p> : null}
      {modules.length === 0 ? <p>{t("noMatch")}</p> : null}
      <ul className="grid gap-4 md:grid-cols-2">
        {modules.map((m) => {
          const done = progress.get(m.slug)?.completed.length ?? 0;
          const total = m.lessons.length;
          const completed = completions.get(m.slug);
          return (
            <li key={m.slug} className="flex flex-col gap-2 rounded border border-line bg-panel p-4" data-testid={`module-${m.slug}`}>
              <p className="font-mono text-xs uppercase text-muted">{t("cardMeta", { order: m.meta.order, minutes: m.lessons.reduce((n, l) => n + l.meta.minutes, 0), hours: Number(m.meta.ceHours) })}</p>
              <h2 className="text-xl"><Link href={`/modules/${m.slug}`}>{m.meta.title}</Link></h2>
              <p className="text-muted">{m.meta.summary}</p>
              <div className="mt-auto">
                <div className="h-2 w-full rounded bg-line" role="progressbar" aria-label={t("lessonsDoneLabel", { module: m.meta.title })} aria-valuemin={0} aria-valuemax={total} aria-valuenow={done}>
                  <div className="h-2 rounded bg-water" style={{ width: `${Math.round((done / total) * 100)}%` }} />
                </div>
                <p className="mt-1 text-sm">{completed ? <strong className="text-pass">{t("complete")}</strong> : t("lessonsDone", { done, total })}</p>
              </div>
            </li>
          );
        })}
      </ul>
    </>
  );
}
