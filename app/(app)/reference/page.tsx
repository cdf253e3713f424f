import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { cardTopic } from "@/lib/content";
import { localizedCatalog } from "@/lib/content";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("reference"))("title") };
}

const AUDIENCES = ["installer", "designer", "sales", "manager"] as const;

export default async function ReferencePage({ searchParams }: { searchParams: Promise<{ topic?: string; audience?: string }> }) {
  await requireViewer("signed-in", "/reference");
  const { topic, audience } = await searchParams;
  const [t, tm] = await Promise.all([getTranslations("reference"), getTranslations("modules")]);
  const topicLabel = (k: string) => (cardTopic.options as readonly string[]).includes(k) ? t(`topic.${k}`) : k;
  const cards = localizedCatalog(localeOf(await getLocale())).cards.filter((c) => (!topic || c.meta.topic === topic) && (!audience || (c.meta.audience as string[]).includes(audience)));
  return (
    <>
      <PageTitle title={t("title")} lead={t("lead")} />
      <form method="get" className="mb-6 flex flex-wrap items-end gap-4 rounded border border-line bg-panel p-3" aria-label={t("filter")}>
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor="topic" className="text-sm font-bold">{t("topicLabel")}</label>
          <select id="topic" name="topic" defaultValue={topic ?? ""} className="min-h-11 max-w-full rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("allTopics")}</option>
            {cardTopic.options.map((k) => <option key={k} value={k}>{topicLabel(k)}</option>)}
          </select>
        </div>
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor="audience" className="text-sm font-bold">{tm("for")}</label>
          <select id="audience" name="audience" defaultValue={audience ?? ""} className="min-h-11 max-w-full rounded border border-ink/40 bg-panel px-2">
            <option value="">{tm("everyone")}</option>
            {AUDIENCES.map((k) => <option key={k} value={k}>{tm(`audience.${k}`)}</option>)}
          </select>
        </div>
        <button type="submit" className="min-h-11 rounded border border-ink/40 bg-paper px-4 font-bold">{tm("apply")}</button>
        {topic || audience ? <Link href="/reference" className="self-center">{tm("clearFilters")}</Link> : null}
      </form>
      <p className="mb-3 text-sm text-muted">{t("count", { count: cards.length })} · <Link href="/glossary">{t("glossaryLink")}</Link></p>
      {cards.length === 0 ? <p>{t("noMatch")}</p> : null}
      <ul className="grid gap-3 md:grid-cols-2 lg:grid-cols-3">
        {cards.map((c) => (
          <li key={c.slug} className="rounded border border-line bg-panel p-4">
            <p className="font-mono text-xs uppercase text-muted">{topicLabel(c.meta.topic)}</p>
            <h2 className="text-lg"><Link href={`/reference/${c.slug}`}>{c.meta.title}</Link></h2>
            <p className="mt-1 text-sm text-muted">{c.meta.summary}</p>
          </li>
        ))}
      </ul>
    </>
  );
}
