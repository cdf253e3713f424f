import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { getLocale, getTranslations } from "next-intl/server";
import { glossaryTerms } from "@/lib/content";
import { INTL_TAG, localeOf } from "@/lib/i18n/browser";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("reference"))("glossary") };
}

export default async function GlossaryPage() {
  await requireViewer("signed-in", "/glossary");
  const [t, tc] = await Promise.all([getTranslations("reference"), getTranslations("content")]);
  const locale = localeOf(await getLocale());
  // Both terms: the reader's language first, and the other language's word for it beside it.
  const other = glossaryTerms(locale === "es" ? "en" : "es");
  const otherTerm = new Map(other.map((x) => [x.id, x.term]));
  const terms = glossaryTerms(locale).sort((a, b) => a.term.localeCompare(b.term, INTL_TAG[locale]));
  const byId = new Map(terms.map((t) => [t.id, t]));
  return (
    <>
      <PageTitle title={t("glossary")} lead={t("glossaryLead")} />
      <dl className="flex max-w-prose flex-col gap-4">
        {terms.map((term) => (
          <div key={term.id} id={term.id} className="scroll-mt-4 rounded border border-line bg-panel p-3">
            <dt className="font-bold">{term.term}</dt>
            {otherTerm.get(term.id) && otherTerm.get(term.id) !== term.term ? (
              <dd className="text-sm text-muted" data-testid="glossary-other-term">
                {tc(locale === "es" ? "englishTerm" : "spanishTerm", { term: otherTerm.get(term.id)! })}
              </dd>
            ) : null}
            <dd className="mt-1">{term.definition}</dd>
            {term.see.length ? <dd className="mt-1 text-sm text-muted">{t("seeAlso")} {term.see.map((s, i) => <span key={s}>{i ? ", " : ""}<a href={`#${s}`}>{byId.get(s)?.term ?? s}</a></span>)}</dd> : null}
          </div>
        ))}
      </dl>
    </>
  );
}
