import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { loadCatalog } from "@/lib/content";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("reference"))("glossary") };
}

export default async function GlossaryPage() {
  await requireViewer("signed-in", "/glossary");
  const [t, locale] = await Promise.all([getTranslations("reference"), getLocale()]);
  const terms = [...loadCatalog().glossary].sort((a, b) => a.term.localeCompare(b.term, locale));
  const byId = new Map(terms.map((t) => [t.id, t]));
  return (
    <>
      <PageTitle title={t("glossary")} lead={t("glossaryLead")} />
      <dl className="flex max-w-prose flex-col gap-4">
        {terms.map((term) => (
          <div key={term.id} id={term.id} className="scroll-mt-4 rounded border border-line bg-panel p-3">
            <dt className="font-bold">{term.term}</dt>
            <dd className="mt-1">{term.definition}</dd>
            {term.see.length ? <dd className="mt-1 text-sm text-muted">{t("seeAlso")} {term.see.map((s, i) => <span key={s}>{i ? ", " : ""}<a href={`#${s}`}>{byId.get(s)?.term ?? s}</a></span>)}</dd> : null}
          </div>
        ))}
      </dl>
    </>
  );
}
