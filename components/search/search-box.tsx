"use client";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState } from "react";
import useSWR from "swr";
import { LiveMessage } from "@/components/ui/live-message";
import { useDebounced } from "@/components/ui/use-debounced";
import { getJson } from "@/lib/fetcher";
import type { SearchHit } from "@/lib/search/browser";
import { plural } from "@/lib/plural";

const KIND_LABEL = { lesson: "Lesson", card: "Code card", term: "Glossary" } as const;

export function SearchBox() {
  const params = useSearchParams();
  const router = useRouter();
  const [q, setQ] = useState(params.get("q") ?? "");
  const debounced = useDebounced(q.trim(), 150);
  const { data, error, isLoading } = useSWR<{ hits: SearchHit[]; didYouMean?: string | null }>(debounced ? `/api/search?q=${encodeURIComponent(debounced)}&limit=20` : null, getJson, { keepPreviousData: true });

  useEffect(() => {
    router.replace(debounced ? `/search?q=${encodeURIComponent(debounced)}` : "/search", { scroll: false });
  }, [debounced, router]);

  const noResults = `No results for “${debounced}”. Try a shorter word or a trade term.`;
  return (
    <div className="flex flex-col gap-4">
      <form role="search" onSubmit={(e) => e.preventDefault()} className="flex flex-col gap-1">
        <label htmlFor="q" className="font-bold">Search lessons, code cards and the glossary</label>
        <input
          id="q"
          type="search"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          maxLength={500}
          autoComplete="off"
          placeholder="e.g. sidewall, antifreeze, friction loss"
          className="min-h-11 rounded border border-ink/40 bg-panel px-3 py-2"
        />
      </form>
      <LiveMessage message={!debounced || !data || isLoading ? "" : data.hits.length === 0 ? noResults : plural(data.hits.length, "result")} testId="search-announcement" />
      <div aria-busy={isLoading}>
        {!debounced ? <p className="text-muted">Type a word to search. Results appear as you type.</p> : null}
        {error ? <p role="alert" className="text-caution">Search is not available right now: {error.message}</p> : null}
        {debounced && isLoading && !data ? <p className="text-muted">Searching…</p> : null}
        {debounced && data?.didYouMean && data.didYouMean !== debounced.toLowerCase() ? (
          <p className="mb-2" data-testid="did-you-mean">
            Did you mean{" "}
            <button type="button" className="font-bold text-water underline" onClick={() => setQ(data.didYouMean!)}>
              {data.didYouMean}
            </button>
            ?
          </p>
        ) : null}
        {debounced && data && data.hits.length === 0 ? <p>{noResults}</p> : null}
        {debounced && data && data.hits.length > 0 ? (
          <>
            <ol className="flex flex-col gap-3">
              {data.hits.map((h) => (
                <li key={h.id} className="rounded border border-line bg-panel p-3">
                  <p className="font-mono text-xs uppercase text-muted">
                    {KIND_LABEL[h.kind]} · {h.context}
                  </p>
                  <Link href={h.href} className="text-lg font-bold">{h.title}</Link>
                  <p className="mt-1 text-sm">
                    {h.snippet.map((s, i) => (s.hit ? <mark key={i} className="bg-copper-light px-0.5 text-ink">{s.text}</mark> : <span key={i}>{s.text}</span>))}
                  </p>
                </li>
              ))}
            </ol>
          </>
        ) : null}
      </div>
    </div>
  );
}
