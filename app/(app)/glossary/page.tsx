import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { getLocale, getTranslations } from "next-intl/server";
import { glossaryTerms } from "@/lib/content";
import { INTL_TAG, localeOf } from "@/lib/i18n/config";

export const metadata: Metadata = { title: "Glossary" };

export default async function GlossaryPage() {
  await requireViewer("signed-in", "/glossary");
  const locale = localeOf(await getLocale());
  const tc = await getTranslations("content");
  // Both terms: the reader's language first, and the other language's word for it beside it.
  const other = glossaryTerms(locale === "es" ? "en" : "es");
  const otherTerm = new Map(other.map((t) => [t.id, t.term]));
  const terms = glossaryTerms(locale).sort((a, b) => a.term.localeCompare(b.term, INTL_TAG[locale]));
  const byId = new Map(terms.map((t) => [t.id, t]));
  return (
    <>
      <PageTitle title="Glossary" lead="The trade's terms as Riser's lessons use them." />
      <dl className="flex max-w-prose flex-col gap-4">
        {terms.map((t) => (
          <div key={t.id} id={t.id} className="scroll-mt-4 rounded border border-line bg-panel p-3">
            <dt className="font-bold">{t.term}</dt>
            {otherTerm.get(t.id) && otherTerm.get(t.id) !== t.term ? (
              <dd className="text-sm text-muted" data-testid="glossary-other-term">
                {tc(locale === "es" ? "englishTerm" : "spanishTerm", { term: otherTerm.get(t.id)! })}
              </dd>
            ) : null}
            <dd className="mt-1">{t.definition}</dd>
            {t.see.length ? <dd className="mt-1 text-sm text-muted">See also: {t.see.map((s, i) => <span key={s}>{i ? ", " : ""}<a href={`#${s}`}>{byId.get(s)?.term ?? s}</a></span>)}</dd> : null}
          </div>
        ))}
      </dl>
    </>
  );
}
