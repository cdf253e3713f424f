import type { Metadata } from "next";
import { getLocale } from "next-intl/server";
import { localeOf } from "@/lib/i18n/config";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { cardTopic } from "@/lib/content";
import { localizedCatalog } from "@/lib/content";

export const metadata: Metadata = { title: "Code-reference cards" };

const TOPIC_LABEL: Record<string, string> = {
  system: "The system", pipe: "Pipe and joining", sprinklers: "Sprinklers and coverage", freeze: "Freeze protection",
  hydraulics: "Hydraulics", testing: "Testing and maintenance", trades: "Other trades", officials: "Officials and permits", sales: "Homebuyers",
};
const AUDIENCES = { installer: "Installers", designer: "Designers", sales: "Sales staff", manager: "Crew leads and managers" } as const;

export default async function ReferencePage({ searchParams }: { searchParams: Promise<{ topic?: string; audience?: string }> }) {
  await requireViewer("signed-in", "/reference");
  const { topic, audience } = await searchParams;
  const cards = localizedCatalog(localeOf(await getLocale())).cards.filter((c) => (!topic || c.meta.topic === topic) && (!audience || (c.meta.audience as string[]).includes(audience)));
  return (
    <>
      <PageTitle title="Code-reference cards" lead="One topic per card, in plain words: what the requirement is for, what to check in the field, and the usual mistakes. Cards point to the standard's topics; your adopted edition governs." />
      <form method="get" className="mb-6 flex flex-wrap items-end gap-4 rounded border border-line bg-panel p-3" aria-label="Filter cards">
        <div className="flex flex-col gap-1">
          <label htmlFor="topic" className="text-sm font-bold">Topic</label>
          <select id="topic" name="topic" defaultValue={topic ?? ""} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
            <option value="">All topics</option>
            {cardTopic.options.map((t) => <option key={t} value={t}>{TOPIC_LABEL[t]}</option>)}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="audience" className="text-sm font-bold">For</label>
          <select id="audience" name="audience" defaultValue={audience ?? ""} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
            <option value="">Everyone</option>
            {Object.entries(AUDIENCES).map(([k, v]) => <option key={k} value={k}>{v}</option>)}
          </select>
        </div>
        <button type="submit" className="min-h-11 rounded border border-ink/40 bg-paper px-4 font-bold">Apply</button>
        {topic || audience ? <Link href="/reference" className="self-center">Clear filters</Link> : null}
      </form>
      <p className="mb-3 text-sm text-muted">{cards.length} cards · <Link href="/glossary">Glossary of trade terms</Link></p>
      {cards.length === 0 ? <p>No card matches these filters.</p> : null}
      <ul className="grid gap-3 md:grid-cols-2 lg:grid-cols-3">
        {cards.map((c) => (
          <li key={c.slug} className="rounded border border-line bg-panel p-4">
            <p className="font-mono text-xs uppercase text-muted">{TOPIC_LABEL[c.meta.topic]}</p>
            <h2 className="text-lg"><Link href={`/reference/${c.slug}`}>{c.meta.title}</Link></h2>
            <p className="mt-1 text-sm text-muted">{c.meta.summary}</p>
          </li>
        ))}
      </ul>
    </>
  );
}
