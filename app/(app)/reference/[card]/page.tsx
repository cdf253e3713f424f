import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getLocale, getTranslations } from "next-intl/server";
import { cards as enCards, esCards } from "@/content/.generated/registry";
import { lessonComponents } from "@/components/lesson/mdx";
import { termFor } from "@/components/lesson/term";
import { LocalRules, editionComponents } from "@/components/lesson/edition";
import { editionText } from "@/components/lesson/lesson-text";
import { adoptedCode, localRulesFor } from "@/lib/editions";
import { requireViewer } from "@/lib/access";
import { cardText, lessonTitle } from "@/lib/content";
import { localeOf } from "@/lib/i18n/browser";

type Params = { params: Promise<{ card: string }> };

export async function generateMetadata({ params }: Params): Promise<Metadata> {
  const { card } = await params;
  return { title: cardText(card, localeOf(await getLocale()))?.meta.title ?? (await getTranslations("reference"))("card") };
}

export default async function CardPage({ params }: Params) {
  const { card: slug } = await params;
  const viewer = await requireViewer("signed-in", `/reference/${slug}`);
  const locale = localeOf(await getLocale());
  const tc = await getTranslations("content");
  const card = cardText(slug, locale);
  const load = (locale === "es" ? esCards : enCards)[slug];
  if (!card || !load) notFound();
  const { default: Body } = await load();
  const [code, rules] = await Promise.all([adoptedCode(viewer.organizationId), localRulesFor(viewer.organizationId, [card.meta.topic])]);
  const [t, tm, editions] = await Promise.all([getTranslations("reference"), getTranslations("modules"), editionText()]);
  return (
    <article className="flex flex-col gap-5">
      <nav aria-label={tm("breadcrumb")} className="text-sm"><Link href="/reference">{t("title")}</Link></nav>
      <header>
        <h1 className="text-3xl">{card.meta.title}</h1>
        <p className="mt-2 max-w-prose text-lg text-muted">{card.meta.summary}</p>
      </header>
      <p className="max-w-prose border-l-4 border-copper pl-3 text-sm" data-testid="edition-note"><strong>{tm("editionNote")}</strong> {card.meta.edition}{code ? ` ${t("orgEdition", { edition: code.edition })}` : null}</p>
      <LocalRules rules={rules} />
      <div className="prose-riser"><Body components={{ ...lessonComponents, Term: termFor(locale, (term) => tc("englishTerm", { term })), ...editionComponents(code?.edition ?? null, editions) }} /></div>
      <section aria-labelledby="related" className="max-w-prose">
        <h2 id="related" className="text-xl">{t("related")}</h2>
        <ul className="mt-2 list-disc pl-6">
          {card.meta.relatedLessons.map((rl) => {
            const [m, l] = rl.split("/") as [string, string];
            return <li key={rl}><Link href={`/modules/${m}/${l}`}>{lessonTitle(m, l, locale)}</Link></li>;
          })}
        </ul>
      </section>
      <section aria-labelledby="sources" className="max-w-prose text-sm">
        <h2 id="sources" className="text-lg">{t("sources")}</h2>
        <ul className="mt-2 list-disc pl-6">{card.meta.sources.map((s) => <li key={s}>{s}</li>)}</ul>
        <p className="mt-2 text-muted">{t("updated", { date: card.meta.updated })}</p>
      </section>
    </article>
  );
}
