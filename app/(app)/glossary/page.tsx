import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { loadCatalog } from "@/lib/content";

export const metadata: Metadata = { title: "Glossary" };

export default async function GlossaryPage() {
  await requireViewer("signed-in", "/glossary");
  const terms = [...loadCatalog().glossary].sort((a, b) => a.term.localeCompare(b.term));
  const byId = new Map(terms.map((t) => [t.id, t]));
  return (
    <>
      <PageTitle title="Glossary" lead="The trade's terms as Riser's lessons use them." />
      <dl className="flex max-w-prose flex-col gap-4">
        {terms.map((t) => (
          <div key={t.id} id={t.id} className="scroll-mt-4 rounded border border-line bg-panel p-3">
            <dt className="font-bold">{t.term}</dt>
            <dd className="mt-1">{t.definition}</dd>
            {t.see.length ? <dd className="mt-1 text-sm text-muted">See also: {t.see.map((s, i) => <span key={s}>{i ? ", " : ""}<a href={`#${s}`}>{byId.get(s)?.term ?? s}</a></span>)}</dd> : null}
          </div>
        ))}
      </dl>
    </>
  );
}
